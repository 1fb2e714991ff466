/**
 * A person's name short enough for a phone's header: first name and the initial of the last
 * ("Priya Raman" → "Priya R."), a one-word name as it is. An e-mail address (shown only for someone
 * who has given no name yet) stays an address, never just the part before the "@". Anything still
 * over `maxLength` characters is cut with an ellipsis.
 */
export function shortPersonName(name: string, maxLength = 16): string {
  const trimmed = name.trim();
  const words = trimmed.includes("@") ? [trimmed] : trimmed.split(/\s+/).filter(Boolean);
  const first = words[0] ?? "";
  const last = words.length > 1 ? words[words.length - 1] : undefined;
  const short = last ? `${first} ${Array.from(last)[0]}.` : first;
  const chars = Array.from(short);
  return chars.length > maxLength ? `${chars.slice(0, maxLength - 1).join("")}…` : short;
}
