// The one clock the test harness goes by, so the seeded demo day and the app server agree on
// whatever date the tests run: the real clock, or PLUMBLINE_FAKE_NOW when it is set (the app
// server reads the same variable through lib/clock.ts, in demo mode only).

/** The instant the tests take as now: `PLUMBLINE_FAKE_NOW` when set, else the real clock. */
export function testClockNow(source: Record<string, string | undefined> = process.env): Date {
  const fake = source.PLUMBLINE_FAKE_NOW;
  if (!fake) return new Date();
  const at = new Date(fake);
  if (Number.isNaN(at.getTime())) throw new Error(`PLUMBLINE_FAKE_NOW is not a date: ${fake}`);
  return at;
}

/**
 * The day a test database is seeded for (`seedDemo`'s `today`, YYYY-MM-DD): the day after the
 * clock's UTC date. The demo event is the Saturday on or after it, so it is 1 to 7 days ahead
 * of the clock: passes can be issued, and no test run reaches the end of the event's day.
 */
export function testSeedDay(clock: Date = testClockNow()): string {
  const next = new Date(clock.getTime());
  next.setUTCDate(next.getUTCDate() + 1);
  return next.toISOString().slice(0, 10);
}
