import "server-only";
import { getPassKeyEventId } from "../../db/queries/get-pass-key-event-id";
import { listEventPassKeys } from "../../db/queries/list-event-pass-keys";
import { listRevokedPassIds } from "../../db/queries/list-revoked-pass-ids";
import { passRefusalMessages, type VerifyPassResult, verifyPass } from "../offline/verify-pass";
import { parseCompactJws } from "./parse-compact-jws";
import { passHeaderSchema } from "./pass-claims-schema";

/** The server's reading of a pass: which event's key it names (if any) and the verdict. */
export type ServerPassCheck = { eventId: string | null; result: VerifyPassResult };

/**
 * Verify a pass on the server with the same `verifyPass` the phones run, against the database's
 * keys and revocations. The event is found from the key id in the header (a database fact),
 * never from the unverified payload. A key no event has means Plumbline never signed it.
 */
export async function verifyPassOnServer({
  token,
  now,
}: {
  token: string;
  now: Date;
}): Promise<ServerPassCheck> {
  const parsed = parseCompactJws(token);
  const header = parsed.ok ? passHeaderSchema.safeParse(parsed.jws.header) : null;
  const eventId = header?.success ? await getPassKeyEventId({ kid: header.data.kid }) : null;
  if (!eventId) {
    // Let verifyPass word the refusal (malformed, or no such key); no event, no keys.
    const result = await verifyPass({ token, eventId: "", keys: [], revokedPassIds: [], now });
    if (!result.ok && result.code !== "malformed") {
      return {
        eventId: null,
        result: {
          ok: false,
          code: "bad-signature",
          message: passRefusalMessages["bad-signature"],
          detail: "no event has this key",
        },
      };
    }
    return { eventId: null, result };
  }
  const [keys, revokedPassIds] = await Promise.all([
    listEventPassKeys({ eventId }),
    listRevokedPassIds({ eventId }),
  ]);
  const result = await verifyPass({ token, eventId, keys, revokedPassIds, now });
  if (!result.ok && result.code === "unknown-key") {
    // The key is the event's but retired: the organizer withdrew every pass it signed.
    return {
      eventId,
      result: { ...result, message: "This pass's key was withdrawn by the organizer." },
    };
  }
  return { eventId, result };
}
