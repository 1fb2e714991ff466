/**
 * Breaks a sentence into drawing lines of at most `maxChars`, first at commas, then between
 * words. SVG text does not wrap, and the server cannot measure it, so characters stand in.
 */
export function wrapWords(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  for (const part of text.split(", ")) {
    let line = "";
    for (const word of part.split(" ")) {
      if (line !== "" && line.length + 1 + word.length > maxChars) {
        lines.push(line);
        line = word;
      } else {
        line = line === "" ? word : `${line} ${word}`;
      }
    }
    if (line !== "") lines.push(line);
  }
  return lines;
}
