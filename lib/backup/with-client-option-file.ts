import { rmSync, writeFileSync } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { clientOptionFileText } from "./client-option-file-text";
import type { DatabaseTarget } from "./parse-database-url";

/**
 * Run `work` with a temporary option file holding the target's credentials (mode 600, in a
 * private mode-700 folder) and remove it afterwards, also when the work fails or the process is
 * interrupted with Ctrl-C or SIGTERM.
 */
export async function withClientOptionFile<T>(
  target: DatabaseTarget,
  work: (optionFile: string) => Promise<T>,
): Promise<T> {
  const folder = await mkdtemp(path.join(tmpdir(), "plumbline-db-"));
  const optionFile = path.join(folder, "client.cnf");
  const removeNow = () => rmSync(folder, { recursive: true, force: true });
  const onSignal = (signal: NodeJS.Signals) => {
    removeNow();
    process.exit(signal === "SIGINT" ? 130 : 143);
  };
  process.once("SIGINT", onSignal);
  process.once("SIGTERM", onSignal);
  try {
    writeFileSync(optionFile, clientOptionFileText(target), { mode: 0o600, flag: "wx" });
    return await work(optionFile);
  } finally {
    process.off("SIGINT", onSignal);
    process.off("SIGTERM", onSignal);
    await rm(folder, { recursive: true, force: true });
  }
}
