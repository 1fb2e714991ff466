import type { ClerkView } from "@/lib/run-sheet/clerk-view";

/** Every published version of the run sheet, newest first: when and by whom. */
export function VersionList({
  versions,
  timeZone,
}: {
  versions: ClerkView["versions"];
  timeZone: string;
}) {
  const when = new Intl.DateTimeFormat("en-GB", {
    timeZone,
    weekday: "short",
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
  });
  return (
    <section className="card space-y-2" aria-labelledby="versions-heading" data-testid="versions">
      <h2 id="versions-heading" className="text-2xl font-bold">
        Published versions
      </h2>
      {versions.length === 0 ? (
        <p className="text-base">Nothing published yet: drivers see no run sheet.</p>
      ) : (
        <ol className="space-y-1 text-base">
          {[...versions]
            .sort((a, b) => b.version - a.version)
            .map((v, i) => (
              <li key={v.version} className="tabular">
                <strong>Version {v.version}</strong>
                {i === 0 ? " (in force)" : ""} · {when.format(new Date(v.publishedAt))}
                {v.publishedBy ? ` · ${v.publishedBy}` : ""}
              </li>
            ))}
        </ol>
      )}
    </section>
  );
}
