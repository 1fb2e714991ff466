/** "wing span" → "Wing span": labels start with a capital, the rest as written. */
export function sentenceCase(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
