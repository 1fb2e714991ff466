/**
 * `<database>-<UTC time>.sql.gz`, the time in ISO 8601 basic format (`20310607T081500Z`): no
 * colons, so the name is valid on the FAT-formatted USB sticks a club copies backups to, and
 * names sort in time order.
 */
export function backupFileName(database: string, at: Date): string {
  const stamp = at
    .toISOString()
    .replace(/\.\d{3}Z$/, "Z")
    .replace(/[-:]/g, "");
  return `${database}-${stamp}.sql.gz`;
}
