"use client";
import { useCallback, useEffect, useMemo, useState } from "react";
import { onOfflineChange } from "@/lib/offline/announce-change";
import { type FetchPackResult, fetchEventPack } from "@/lib/offline/fetch-event-pack";
import { listLocalRecords } from "@/lib/offline/list-local-records";
import { loadEventPack } from "@/lib/offline/load-event-pack";
import type { LocalRecord } from "@/lib/offline/local-record";
import type { StoredPack } from "@/lib/offline/save-event-pack";
import { type RuleSet, ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";

export type TechData = {
  loading: boolean;
  pack: StoredPack | undefined;
  ruleSet: RuleSet | null;
  local: LocalRecord[];
  lastFetch: FetchPackResult | null;
  refresh: () => Promise<FetchPackResult>;
  reloadLocal: () => Promise<void>;
};

/** The tech line's data on this phone: the stored event pack and this phone's own records. */
export function useTechData(eventId: string): TechData {
  const [pack, setPack] = useState<StoredPack | undefined>();
  const [local, setLocal] = useState<LocalRecord[]>([]);
  const [loading, setLoading] = useState(true);
  const [lastFetch, setLastFetch] = useState<FetchPackResult | null>(null);

  const reloadLocal = useCallback(async () => setLocal(await listLocalRecords(eventId)), [eventId]);
  const reloadPack = useCallback(async () => setPack(await loadEventPack(eventId)), [eventId]);
  const refresh = useCallback(async () => {
    const result = await fetchEventPack(eventId);
    setLastFetch(result);
    setPack(result.pack);
    return result;
  }, [eventId]);

  useEffect(() => {
    let alive = true;
    (async () => {
      const [stored] = await Promise.all([loadEventPack(eventId), reloadLocal()]);
      if (!alive) return;
      setPack(stored);
      setLoading(false);
      if (navigator.onLine) await refresh();
    })();
    const stop = onOfflineChange((change) => {
      if (change.eventId !== eventId) return;
      if (change.type === "records") void reloadLocal();
      else void reloadPack();
    });
    return () => {
      alive = false;
      stop();
    };
  }, [eventId, refresh, reloadLocal, reloadPack]);

  const ruleSet = useMemo(() => {
    if (!pack) return null;
    const parsed = ruleSetSchema.safeParse(pack.ruleSet);
    return parsed.success ? parsed.data : null;
  }, [pack]);

  return { loading, pack, ruleSet, local, lastFetch, refresh, reloadLocal };
}
