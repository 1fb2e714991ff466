import type { DatabaseTarget } from "./parse-database-url";

/**
 * A value for a MariaDB option file, in double quotes with `\` and `"` escaped and line breaks
 * and tabs written as escapes, so a password with `#`, spaces, quotes or backslashes reads back
 * exactly (MariaDB "Configuring MariaDB with Option Files": quoted values, escape sequences
 * \b \t \n \r \\ \s; the quote escapes are read by mysys's option-file reader).
 */
export function optionFileValue(value: string): string {
  const escapes: Record<string, string> = {
    "\\": "\\\\",
    '"': '\\"',
    "\n": "\\n",
    "\r": "\\r",
    "\t": "\\t",
    "\b": "\\b",
  };
  return `"${value.replace(/[\\"\n\r\t\b]/g, (c) => escapes[c] ?? c)}"`;
}

/**
 * The `[client]` group the clients read through `--defaults-extra-file`: the credentials stay
 * in a file only its owner can read instead of on the command line, where `ps` shows them.
 * `protocol=TCP` makes `localhost` mean TCP as it does for mysql2, not the Unix socket.
 */
export function clientOptionFileText(target: DatabaseTarget): string {
  return [
    "[client]",
    `user=${optionFileValue(target.user)}`,
    `password=${optionFileValue(target.password)}`,
    `host=${optionFileValue(target.host)}`,
    `port=${target.port}`,
    "protocol=TCP",
    "",
  ].join("\n");
}
