import { BODY_LIMITS } from "./body-limits";

/**
 * The largest body a server action posted to this page may send, in bytes: the organizer's
 * class-rules editor takes a whole rule set; every other form (sign-in, revoking a pass) is small.
 */
export function actionBodyLimit(pathname: string): number {
  if (/^\/organizer\/[^/]+\/rules\/?$/.test(pathname)) return BODY_LIMITS.ruleSetDraft;
  return BODY_LIMITS.default;
}
