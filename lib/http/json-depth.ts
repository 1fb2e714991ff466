/**
 * How deeply arrays and objects nest in a JSON text (0 for a bare value), counted without
 * parsing it, so a hostile text cannot exhaust a parser's stack before the count is known.
 * Brackets inside strings do not count.
 */
export function jsonDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i += 1; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      depth += 1;
      if (depth > deepest) deepest = depth;
    } else if (c === 0x5d || c === 0x7d) depth -= 1;
  }
  return deepest;
}
