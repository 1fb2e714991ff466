import "server-only";
import { cache } from "react";
import { auth } from "../../auth";

export type SessionUser = { id: string; name: string | null; email: string | null };

/** The signed-in person for this request, or null. Cached per request. */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const session = await auth();
  const id = session?.user?.id;
  if (!id) return null;
  return { id, name: session.user?.name ?? null, email: session.user?.email ?? null };
});
