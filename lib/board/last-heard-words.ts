/**
 * How long ago the server last answered, in words for the board ("Last heard from the server
 * 4 min ago"). Under a minute says "just now"; whole minutes below an hour; hours and minutes
 * after that. A negative age (the screen's clock stepped back) counts as just now.
 * @param ageMs now minus the time of the last answer, milliseconds
 */
export function lastHeardWords(ageMs: number): string {
  const minutes = Math.floor(Math.max(0, ageMs) / 60_000);
  if (minutes < 1) return "Last heard from the server just now";
  if (minutes < 60) return `Last heard from the server ${minutes} min ago`;
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  return `Last heard from the server ${hours} h${rest > 0 ? ` ${rest} min` : ""} ago`;
}
