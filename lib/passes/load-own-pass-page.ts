import "server-only";
import { forbidden, notFound } from "next/navigation";
import { type EntryForPass, getEntryForPass } from "../../db/queries/get-entry-for-pass";
import { isOwnEntry } from "../../db/queries/is-own-entry";
import { type IssuedPass, issuePass } from "../../db/queries/issue-pass";
import { requirePagePermission, requirePageUser } from "../auth/require-page-permission";
import { clock } from "../clock";
import { env } from "../env";
import { idSchema } from "../http/id-schema";
import { passBlockers } from "./pass-blockers";
import { passValidityWindow } from "./pass-expiry";
import { passQrSvg } from "./pass-qr-svg";
import { passUrl } from "./pass-url";

export type OwnPassPage = {
  entry: EntryForPass;
  /** Why there is no pass yet; empty when `pass` is set. */
  blockers: string[];
  pass: (IssuedPass & { url: string; qrSvg: string }) | null;
};

/**
 * For the entrant's pass page: signed in (else sign-in), a real entry (else 404), an entrant of
 * its event with `own-entries.read` and the driver, co-driver or car owner of this very entry
 * (else 403); then the entry's pass (reused or newly signed) and its QR, or why there is none.
 */
export async function loadOwnPassPage({
  entryId,
  returnTo,
}: {
  entryId: string;
  returnTo: string;
}): Promise<OwnPassPage> {
  const user = await requirePageUser(returnTo);
  if (!idSchema.safeParse(entryId).success) notFound();
  const entry = await getEntryForPass({ entryId });
  if (!entry) notFound();
  await requirePagePermission({ eventId: entry.eventId, permission: "own-entries.read", returnTo });
  if (!(await isOwnEntry({ entryId, userId: user.id }))) forbidden();

  const now = clock.now();
  const window = passValidityWindow({
    issuedAt: now,
    eventDate: entry.eventDate,
    timeZone: entry.timeZone,
  });
  const blockers = passBlockers({ ...entry, eventOver: window.exp <= window.iat });
  if (blockers.length > 0) return { entry, blockers, pass: null };
  const pass = await issuePass({ entryId, actorId: user.id, now });
  const url = passUrl(env.APP_URL, pass.token);
  return { entry, blockers: [], pass: { ...pass, url, qrSvg: await passQrSvg(url) } };
}
