import type { VerdictWord } from "../verdict-word";

/** What an entrant sees of their entry's scrutineering result (GET /api/entries/[id]/verdict). */
export type EntryResult = {
  entryId: string;
  eventId: string;
  eventName: string;
  carNumber: number;
  car: string;
  drivers: string;
  declaredClass: string;
  status: VerdictWord;
  className: string | null;
  reason: string;
  /** When the chief scrutineer's decision stands: "Helen Marsh at 10:42 on Sat 16 May". */
  decidedBy: string | null;
  /** One line per rule or safety item that decided the verdict (over, unsure or failed first). */
  lines: { outcome: string; reason: string }[];
  notice: string | null;
  computedAt: string | null;
  /** New records arrived and the server is re-deriving this verdict: it may change shortly. */
  recomputing: boolean;
};
