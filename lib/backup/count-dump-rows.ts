import { createReadStream } from "node:fs";
import { createInterface } from "node:readline";
import { createGunzip } from "node:zlib";
import { readDumpLine } from "./read-dump-line";

/** The tables a dump file defines, with the rows it holds for each, and whether it is whole. */
export type DumpContents = { rows: Map<string, number>; completed: boolean };

/**
 * Read a gzip-compressed dump back and count its rows per table (a table with no rows counts
 * 0). Reading it all also proves the file decompresses; `completed` is false when the dump
 * stopped before `mariadb-dump` wrote its closing line.
 */
export async function countDumpRows(file: string): Promise<DumpContents> {
  const rows = new Map<string, number>();
  let completed = false;
  const source = createReadStream(file);
  const input = createGunzip();
  // A missing file reaches the reader as the decompressor's error, which ends the loop below.
  source.on("error", (error) => input.destroy(error));
  const lines = createInterface({ input: source.pipe(input), crlfDelay: Number.POSITIVE_INFINITY });
  for await (const line of lines) {
    const read = readDumpLine(line);
    if (read.kind === "table") rows.set(read.table, rows.get(read.table) ?? 0);
    else if (read.kind === "row") rows.set(read.table, (rows.get(read.table) ?? 0) + 1);
    else if (read.kind === "completed") completed = true;
  }
  return { rows, completed };
}
