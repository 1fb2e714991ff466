import { queryTestDb } from "../../tests/support/query-test-db";

// Facts about this run's seeded database, read with SQL so a spec never hard-codes a car number
// the seed happens to give (the seed is invented; it may change).

const databaseUrl = () => {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (run through scripts/e2e.sh)");
  return url;
};

type ClassBody = { classes: { id: string; name: string }[] };

/** The event's classes, lowest first, from its pinned rule set. */
async function eventClasses(): Promise<ClassBody["classes"]> {
  const [row] = await queryTestDb<{ body: string | ClassBody }>(
    databaseUrl(),
    `select v.body from events e join rule_set_versions v on v.id = e.rule_set_version_id order by e.event_date limit 1`,
  );
  const body = typeof row?.body === "string" ? (JSON.parse(row.body) as ClassBody) : row?.body;
  return body?.classes ?? [];
}

/** The event's class names, lowest first. */
export async function classLadder(): Promise<string[]> {
  return (await eventClasses()).map((c) => c.name);
}

/** A driver (e-mail) whose entry the verdict moved up, signed on so it has a pass; the class
 *  names it declared and runs in. */
export async function movedUpEntrant() {
  const [row] = await queryTestDb<{
    email: string;
    car_number: number;
    declared: string;
    final: string;
  }>(
    databaseUrl(),
    `select u.email, e.car_number, e.declared_class as declared, v.final_class as final
       from entries e
       join users u on u.id = e.driver_id
       join verdicts v on v.entry_id = e.id and v.status = 'moved-up'
      where e.co_driver_id is null
        and exists (select 1 from payments p where p.entry_id = e.id and p.status = 'paid')
        and exists (select 1 from waivers w where w.entry_id = e.id and w.is_minor = 0)
      order by e.car_number limit 1`,
  );
  if (!row) throw new Error("the demo has no signed-on moved-up entry");
  const classes = await eventClasses();
  const name = (id: string) => classes.find((c) => c.id === id)?.name ?? id;
  return { ...row, declared: name(row.declared), final: name(row.final) };
}

/** The car number of a cleared (or moved-up) minor whose guardian has not co-signed. */
export async function clearedMinorWithoutGuardian(): Promise<number> {
  const [row] = await queryTestDb<{ car_number: number }>(
    databaseUrl(),
    `select e.car_number from entries e
       join verdicts v on v.entry_id = e.id and v.status in ('cleared', 'moved-up')
       join waivers w on w.entry_id = e.id and w.is_minor = 1 and w.guardian_signed_at is null
      order by e.car_number limit 1`,
  );
  if (!row) throw new Error("the demo has no cleared minor without a guardian's signature");
  return row.car_number;
}
