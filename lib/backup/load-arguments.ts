/**
 * Arguments for Debian's `mariadb` client reading a dump on its standard input into `database`.
 * Credentials come only from the option file (the first argument), never the command line.
 * Without `--force` the client stops at the first failing statement and exits non-zero.
 */
export function loadArguments(optionFile: string, database: string): string[] {
  return [
    `--defaults-extra-file=${optionFile}`,
    "--default-character-set=utf8mb4",
    "--batch",
    `--database=${database}`,
  ];
}
