import "server-only";
import { and, eq, isNull, max, ne, sql } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { chooseCarNumber } from "../../../lib/entries/choose-car-number";
import { entryWindowProblem } from "../../../lib/entries/entry-window-problem";
import { AppError } from "../../../lib/errors";
import { formatMoney } from "../../../lib/format-money";
import { SEND_MAIL } from "../../../lib/jobs/job-kinds";
import { composeEntryReceivedMail } from "../../../lib/mail/compose-entry-received-mail";
import type { ExperienceLevel } from "../../../lib/paddock/drive";
import { classNamesFromRuleSet } from "../../../lib/passes/class-names-from-rule-set";
import { formatEventDay } from "../../../lib/passes/format-event-day";
import { runTransaction } from "../../run-transaction";
import { cars, entries, events, ruleSetVersions, users } from "../../schema";
import { enqueueJobs } from "../jobs/enqueue-jobs";
import { insertCoDriverInvite } from "./insert-co-driver-invite";

export type CreatedEntry = {
  entryId: string;
  status: "entered" | "waiting";
  carNumber: number;
  waitingSeq: number | null;
};

/**
 * Enter a car in an event, safe under concurrency: the event's row is locked (`select … for
 * update`) for the whole transaction, so entries are taken one at a time in the order of the
 * lock. Inside it: the event must be taking entries at `now`; the car must be the driver's own,
 * not retired and not already in the event; the class must be one of the event's. The field is
 * counted (`entered`): below capacity the entry is `entered`, else `waiting` with the next
 * `waitingSeq`. The car number is the lowest free number ≥ 2 in the event, withdrawn entries'
 * numbers included (never handed out twice). The entry-received e-mail (and the co-driver's
 * invitation, if one is named) are queued in the same transaction.
 */
export async function createEntry(opts: {
  eventId: string;
  driverId: string;
  carId: string;
  classId: string;
  lapTimeEstimateMs: number;
  experience: ExperienceLevel;
  coDriverEmail?: string;
  now: Date;
  appUrl: string;
}): Promise<CreatedEntry> {
  return runTransaction(async (tx) => {
    const [event] = await tx
      .select({
        id: events.id,
        name: events.name,
        eventDate: events.eventDate,
        status: events.status,
        capacity: events.capacity,
        entriesOpenAt: events.entriesOpenAt,
        entriesCloseAt: events.entriesCloseAt,
        entryFeeMinor: events.entryFeeMinor,
        currency: events.currency,
        ruleSetVersionId: events.ruleSetVersionId,
      })
      .from(events)
      .where(eq(events.id, opts.eventId))
      .for("update");
    if (!event) throw new AppError("not_found", "There is no such event.");
    const windowProblem = entryWindowProblem(
      { status: event.status, opensAt: event.entriesOpenAt, closesAt: event.entriesCloseAt },
      opts.now,
    );
    if (windowProblem) throw new AppError("conflict", windowProblem);

    const [version] = await tx
      .select({ body: ruleSetVersions.body })
      .from(ruleSetVersions)
      .where(eq(ruleSetVersions.id, event.ruleSetVersionId));
    const classNames = classNamesFromRuleSet(version?.body);
    const className = classNames[opts.classId];
    if (!className) {
      throw new AppError("invalid_input", "Choose one of this event's classes.", {
        classId: ["Choose one of this event's classes."],
      });
    }

    const [car] = await tx
      .select({ make: cars.make, model: cars.model, year: cars.year })
      .from(cars)
      .where(and(eq(cars.id, opts.carId), eq(cars.ownerId, opts.driverId), isNull(cars.retiredAt)));
    if (!car) {
      throw new AppError("invalid_input", "Choose one of your cars.", {
        carId: ["Choose one of your cars (a retired car cannot enter)."],
      });
    }
    const [already] = await tx
      .select({ id: entries.id })
      .from(entries)
      .where(
        and(
          eq(entries.eventId, opts.eventId),
          eq(entries.carId, opts.carId),
          ne(entries.status, "withdrawn"),
        ),
      )
      .limit(1);
    if (already) {
      throw new AppError("conflict", "This car is already entered in this event.", {
        carId: ["This car is already entered in this event."],
      });
    }
    const [driver] = await tx
      .select({ email: users.email, name: users.name })
      .from(users)
      .where(eq(users.id, opts.driverId));
    if (!driver) throw new AppError("unauthenticated", "Sign in first.");
    if (opts.coDriverEmail && opts.coDriverEmail === driver.email) {
      throw new AppError("invalid_input", "Your co-driver must be someone else.", {
        coDriverEmail: ["That is your own address: your co-driver must be someone else."],
      });
    }

    const numbers = await tx
      .select({ carNumber: entries.carNumber })
      .from(entries)
      .where(eq(entries.eventId, opts.eventId));
    const carNumber = chooseCarNumber(numbers.map((n) => n.carNumber));
    const [counts] = await tx
      .select({
        entered: sql<number>`sum(case when ${entries.status} = 'entered' then 1 else 0 end)`,
        waiting: sql<number>`sum(case when ${entries.status} = 'waiting' then 1 else 0 end)`,
        lastSeq: max(entries.waitingSeq),
      })
      .from(entries)
      .where(eq(entries.eventId, opts.eventId));
    const entered = Number(counts?.entered ?? 0);
    const status = entered < event.capacity ? "entered" : "waiting";
    const waitingSeq = status === "waiting" ? Number(counts?.lastSeq ?? 0) + 1 : null;

    const entryId = uuidv7();
    await tx.insert(entries).values({
      id: entryId,
      eventId: opts.eventId,
      carId: opts.carId,
      carNumber,
      declaredClass: opts.classId,
      driverId: opts.driverId,
      lapTimeEstimateMs: opts.lapTimeEstimateMs,
      driverExperience: opts.experience,
      declarations: {},
      status,
      waitingSeq,
      createdAt: opts.now,
      updatedAt: opts.now,
    });

    const carWords = `${car.year} ${car.make} ${car.model}`;
    const eventDay = formatEventDay(event.eventDate);
    const mail = composeEntryReceivedMail({
      eventName: event.name,
      eventDay,
      carNumber,
      car: carWords,
      className,
      status,
      // The newest on the list is last in it: its place is the number already waiting, plus one.
      waitingPlace: waitingSeq === null ? null : Number(counts?.waiting ?? 0) + 1,
      fee: formatMoney(event.entryFeeMinor, event.currency),
      entryUrl: new URL(`/entries/${entryId}`, opts.appUrl).toString(),
    });
    await enqueueJobs(
      [
        {
          kind: SEND_MAIL,
          payload: { to: driver.email, ...mail, kind: "entry-received", eventId: opts.eventId },
          dedupeKey: `entry-received:${entryId}`,
        },
      ],
      tx,
    );
    if (opts.coDriverEmail) {
      await insertCoDriverInvite(tx, {
        entryId,
        eventId: opts.eventId,
        email: opts.coDriverEmail,
        invitedBy: opts.driverId,
        now: opts.now,
        appUrl: opts.appUrl,
        mail: {
          inviterName: driver.name ?? driver.email,
          eventName: event.name,
          eventDay,
          carNumber,
          car: carWords,
          className,
        },
      });
    }
    return { entryId, status, carNumber, waitingSeq };
  });
}
