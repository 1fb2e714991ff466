/** Lower-cases the first letter for use mid-sentence, unless it starts an acronym ("FIA …"). */
export function midSentence(text: string): string {
  const [a, b] = [text[0], text[1]];
  if (a === undefined || (b !== undefined && b === b.toUpperCase() && b !== b.toLowerCase()))
    return text;
  return a.toLowerCase() + text.slice(1);
}
