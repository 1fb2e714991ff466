const words = (text: string) =>
  text
    .trim()
    .split(/\s+/)
    .filter((w) => w !== "");

/**
 * Names a piece of certified equipment by its checklist item and standard without saying a word
 * twice: ("Harness", "FIA 8853/98") → "Harness FIA 8853/98"; ("Fire extinguisher",
 * "Extinguisher service check") → "Fire extinguisher service check"; when the standard's name
 * already names the item elsewhere, the standard's name alone.
 */
export function equipmentSubject(itemLabel: string, standardName: string): string {
  const item = words(itemLabel);
  const standard = words(standardName);
  const last = item[item.length - 1]?.toLowerCase();
  const same = (w: string) => w.toLowerCase() === last;
  if (last === undefined || standard.length === 0) return `${itemLabel} ${standardName}`.trim();
  if (standard[0] !== undefined && same(standard[0])) {
    return [...item, ...standard.slice(1)].join(" ");
  }
  if (standard.some(same)) {
    const name = standard.join(" ");
    return name.charAt(0).toUpperCase() + name.slice(1);
  }
  return `${itemLabel} ${standardName}`;
}
