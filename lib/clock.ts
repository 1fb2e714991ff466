import { env } from "./env";

// Where the fake clock started, on globalThis so every bundle of one server process shares it.
const globalForClock = globalThis as unknown as {
  plumblineClock?: { fakeStartMs: number; realStartMs: number };
};

/**
 * The server's clock, read by every path that depends on the time of day: pass issue and expiry,
 * the pass check, receive times and verdict `computedAt` at sync, the event pack's cursor, the
 * paddock board, audit and rule-set times. It is the real clock, except in demo mode with
 * `PLUMBLINE_FAKE_NOW` set (lib/env.ts refuses it otherwise): then it reads that instant at its
 * first reading in the process (or at `PLUMBLINE_FAKE_NOW_SINCE`, which the start scripts set so
 * the app and the worker agree) and runs on from there at the real pace, so the demo and the
 * tests can be run as of any day. Code in lib/scrutineer never reads it: time is a parameter.
 */
export const clock = {
  now(): Date {
    const fake = env.PLUMBLINE_FAKE_NOW;
    if (!fake) return new Date();
    globalForClock.plumblineClock ??= {
      fakeStartMs: Date.parse(fake),
      realStartMs: env.PLUMBLINE_FAKE_NOW_SINCE ?? Date.now(),
    };
    const { fakeStartMs, realStartMs } = globalForClock.plumblineClock;
    return new Date(fakeStartMs + (Date.now() - realStartMs));
  },
};
