import type { VerdictWord } from "../verdict-word";
import type { SignOnState } from "./sign-on-state";

export type EntryListRow = {
  entryId: string;
  carNumber: number;
  declaredClass: string;
  finalClass: string | null;
  car: string;
  drivers: string;
  status: VerdictWord;
  reason: string | null;
  needsChief: boolean;
  /** Shown only where a page passes it (the clerk's list): whether the entry is signed on. */
  signOn?: SignOnState;
};

type Source = {
  entryId: string;
  carNumber: number;
  declaredClassName: string;
  finalClassName: string | null;
  make: string;
  model: string;
  year: number;
  driverName: string | null;
  coDriverName: string | null;
  status: VerdictWord;
  reason: string | null;
  needsChief: boolean;
};

/** Shape an entry row from the database for the shared entry list. */
export function toEntryListRow(row: Source): EntryListRow {
  return {
    entryId: row.entryId,
    carNumber: row.carNumber,
    declaredClass: row.declaredClassName,
    finalClass: row.finalClassName,
    car: `${row.year} ${row.make} ${row.model}`,
    drivers: [row.driverName, row.coDriverName].filter(Boolean).join(" & "),
    status: row.status,
    reason: row.reason,
    needsChief: row.needsChief,
  };
}
