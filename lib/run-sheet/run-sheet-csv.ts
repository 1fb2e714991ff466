import { stringify } from "csv-stringify/sync";
import type { Drive, ExperienceLevel } from "@/lib/paddock/drive";
import { localIsoDateTime } from "@/lib/paddock/local-iso-date-time";
import type { RunSheet } from "@/lib/paddock/run-sheet-schema";

const experienceLabels: Record<ExperienceLevel, string> = {
  novice: "Novice",
  intermediate: "Intermediate",
  advanced: "Advanced",
  expert: "Expert",
};

/** A lap time in milliseconds as m:ss.sss ("1:42.500"); empty when the driver gave none. */
function lapText(ms: number | null): string {
  if (ms === null) return "";
  const minutes = Math.floor(ms / 60_000);
  const seconds = (ms - minutes * 60_000) / 1000;
  return `${minutes}:${seconds.toFixed(3).padStart(6, "0")}`;
}

/**
 * The run sheet as CSV (RFC 4180: comma-separated, CRLF line ends, a header line), one row per
 * drive in rotation order then run order: group, run order in the group (from 1), car, driver,
 * class, experience, lap estimate, and each round's session start as the venue's local time in
 * ISO 8601 with its UTC offset ("2027-03-28T09:00:00+01:00"), so a time in the hour a clock change
 * repeats is still unambiguous. A drive in no group comes last with those cells empty. Text a
 * spreadsheet would run as a formula gets a leading apostrophe (OWASP, CSV injection).
 */
export function runSheetCsv(runSheet: RunSheet): string {
  const rounds = Math.max(0, ...runSheet.sessions.map((s) => s.round));
  const roundNumbers = Array.from({ length: rounds }, (_, i) => i + 1);
  const startOf = new Map(runSheet.sessions.map((s) => [s.key, s.startsAt]));
  const drives = new Map(runSheet.drives.map((d) => [d.driveId, d]));

  const row = (drive: Drive, group: string, order: number | null, groupIndex: number | null) => [
    group,
    order ?? "",
    drive.carNumber,
    drive.driverName,
    drive.className,
    experienceLabels[drive.experience],
    lapText(drive.lapTimeMs),
    ...roundNumbers.map((round) => {
      const startsAt = groupIndex === null ? undefined : startOf.get(`${round}-${groupIndex}`);
      return startsAt === undefined ? "" : localIsoDateTime(startsAt, runSheet.timeZone);
    }),
  ];

  const placed = new Set<string>();
  const records: (string | number)[][] = [];
  runSheet.groups.forEach((group, g) => {
    group.driveIds.forEach((driveId, i) => {
      const drive = drives.get(driveId);
      if (drive === undefined) return;
      placed.add(driveId);
      records.push(row(drive, group.name, i + 1, g + 1));
    });
  });
  for (const drive of runSheet.drives) {
    if (!placed.has(drive.driveId)) records.push(row(drive, "", null, null));
  }

  return stringify(records, {
    header: true,
    columns: [
      "Group",
      "Run order",
      "Car",
      "Driver",
      "Class",
      "Experience",
      "Lap estimate",
      ...roundNumbers.map((r) => `Round ${r} start`),
    ],
    record_delimiter: "windows",
    quoted_match: /[\r\n]/,
    escape_formulas: true,
  });
}
