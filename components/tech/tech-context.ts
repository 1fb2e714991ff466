"use client";
import { createContext, useContext } from "react";
import type { LocalRecord } from "@/lib/offline/local-record";
import type { StoredPack } from "@/lib/offline/save-event-pack";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSet } from "@/lib/scrutineer/rule-sets/rule-set-schema";

/** What every part of the tech line needs: who is recording, on which phone, with what pack. */
export type TechContextValue = {
  eventId: string;
  official: { id: string; name: string };
  deviceId: string;
  canWrite: boolean;
  canChief: boolean;
  pack: StoredPack;
  ruleSet: RuleSet;
  local: LocalRecord[];
  /** Save a new record on the phone at once (and queue it for sending). */
  record: (record: TechRecord, blob?: Blob) => Promise<void>;
};

export const TechContext = createContext<TechContextValue | null>(null);

export function useTech(): TechContextValue {
  const value = useContext(TechContext);
  if (!value) throw new Error("useTech outside the tech line");
  return value;
}
