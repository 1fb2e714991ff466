/** A MariaDB identifier in backticks, with any backtick in it doubled. */
export function quoteIdentifier(name: string): string {
  return `\`${name.replaceAll("`", "``")}\``;
}
