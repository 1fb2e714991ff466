/** Who made a record and when, as the car card shows it: "by you · 10:42". */
export function recordByline(args: {
  officialId: string;
  deviceTime: string;
  me: string;
  officials: ReadonlyArray<{ userId: string; name: string }>;
  timeZone: string;
}): string {
  const who =
    args.officialId === args.me
      ? "you"
      : (args.officials.find((o) => o.userId === args.officialId)?.name ?? "another official");
  const when = new Intl.DateTimeFormat("en-GB", {
    hour: "2-digit",
    minute: "2-digit",
    timeZone: args.timeZone,
  }).format(new Date(args.deviceTime));
  return `by ${who} · ${when}`;
}
