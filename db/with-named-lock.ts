import "server-only";
import type { RowDataPacket } from "mysql2/promise";
import { getPool } from "./client";

/**
 * Run `work` holding MariaDB's named lock `name` (`GET_LOCK`, held by one connection kept aside
 * for it), so two processes doing the same work for the same thing take turns. Waits up to
 * `waitSeconds`, then throws (the caller's job is retried later).
 */
export async function withNamedLock<T>(
  name: string,
  waitSeconds: number,
  work: () => Promise<T>,
): Promise<T> {
  const connection = await getPool().getConnection();
  try {
    const [rows] = await connection.query<RowDataPacket[]>("SELECT GET_LOCK(?, ?) AS got", [
      name,
      waitSeconds,
    ]);
    if (Number(rows[0]?.got) !== 1) {
      throw new Error(`lock ${name} still held by another process after ${waitSeconds} s`);
    }
    try {
      return await work();
    } finally {
      await connection.query("SELECT RELEASE_LOCK(?)", [name]).catch(() => undefined);
    }
  } finally {
    connection.release();
  }
}
