import "server-only";
import { pingDatabase } from "../../db/queries/ping-database";
import { getMailTransport } from "../mail/mail-transport";

export type HealthReport = {
  ok: boolean;
  checks: { database: { ok: boolean; detail: string }; mail: { ok: boolean; detail: string } };
};

async function timed<T>(work: Promise<T>, ms: number): Promise<T> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms);
  });
  try {
    return await Promise.race([work, timeout]);
  } finally {
    clearTimeout(timer);
  }
}

/** Can the app reach its database and its mail server right now? */
export async function checkHealth(): Promise<HealthReport> {
  const [database, mail] = await Promise.allSettled([
    timed(pingDatabase(), 3000),
    timed(getMailTransport().verify(), 3000),
  ]);
  const checks = {
    database:
      database.status === "fulfilled"
        ? { ok: true, detail: `reachable, ${database.value.migrations} migrations applied` }
        : { ok: false, detail: `database unreachable: ${reason(database.reason)}` },
    mail:
      mail.status === "fulfilled"
        ? { ok: true, detail: "SMTP server answered" }
        : { ok: false, detail: `mail server unreachable: ${reason(mail.reason)}` },
  };
  return { ok: checks.database.ok && checks.mail.ok, checks };
}

function reason(error: unknown): string {
  if (error instanceof Error) return (error as Error & { code?: string }).code ?? error.message;
  return String(error);
}
