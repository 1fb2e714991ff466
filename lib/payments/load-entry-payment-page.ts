import "server-only";
import { forbidden, notFound } from "next/navigation";
import {
  type EntryPaymentFacts,
  getEntryPaymentFacts,
} from "../../db/queries/payments/get-entry-payment-facts";
import { requirePageUser } from "../auth/require-page-permission";
import { AppError } from "../errors";
import { idSchema } from "../http/id-schema";
import { requireEntryPayer } from "./require-entry-payer";

/**
 * For the pay and withdraw pages: signed in (else sign-in), a real entry (else 404), its driver
 * or its car's owner (else 403); then what the pages show.
 */
export async function loadEntryPaymentPage({
  entryId,
  returnTo,
}: {
  entryId: string;
  returnTo: string;
}): Promise<EntryPaymentFacts> {
  const user = await requirePageUser(returnTo);
  if (!idSchema.safeParse(entryId).success) notFound();
  const facts = await getEntryPaymentFacts({ entryId });
  if (!facts) notFound();
  try {
    requireEntryPayer(facts, user.id);
  } catch (error) {
    if (error instanceof AppError) forbidden();
    throw error;
  }
  return facts;
}
