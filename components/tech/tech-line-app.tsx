"use client";
import { useCallback, useEffect, useMemo, useState } from "react";
import { EntryList } from "@/components/entry-list";
import { StatusCounts } from "@/components/status-counts";
import { addLocalRecord } from "@/lib/offline/add-local-record";
import { getDeviceId } from "@/lib/offline/get-device-id";
import { isPending } from "@/lib/offline/local-record";
import { mergeEntryRecords } from "@/lib/offline/merge-entry-records";
import { prepareForOffline } from "@/lib/offline/prepare-for-offline";
import { previewVerdict } from "@/lib/offline/preview-verdict";
import { requestBackgroundSync } from "@/lib/offline/request-background-sync";
import { recordSchema, type TechRecord } from "@/lib/scrutineer/records/record-schema";
import { CarCard } from "./car-card";
import { FindCar } from "./find-car";
import { OutboxPanel } from "./outbox-panel";
import { PackStatus } from "./pack-status";
import { TechContext, type TechContextValue } from "./tech-context";
import { useOutboxRunner } from "./use-outbox-runner";
import { useTechData } from "./use-tech-data";

/**
 * The tech line on a scrutineer's phone. Runs from the event pack and the outbox in IndexedDB, so
 * it works with no signal once prepared; the selected car lives in `?entry=` so a reload (even
 * offline) comes back to the same car card.
 */
export function TechLineApp(props: {
  eventId: string;
  official: { id: string; name: string };
  canWrite: boolean;
  canChief: boolean;
  pagePaths: string[];
}) {
  const { eventId } = props;
  const data = useTechData(eventId);
  const [deviceId, setDeviceId] = useState<string | null>(null);
  const [entryId, setEntryId] = useState<string | null>(null);
  const [preparing, setPreparing] = useState(false);
  const [prepareMessage, setPrepareMessage] = useState<string | null>(null);
  const pending = data.local.filter(isPending).length;
  const outbox = useOutboxRunner(eventId, pending);

  useEffect(() => {
    void getDeviceId().then(setDeviceId);
    const read = () => setEntryId(new URLSearchParams(window.location.search).get("entry"));
    read();
    window.addEventListener("popstate", read);
    return () => window.removeEventListener("popstate", read);
  }, []);

  const open = useCallback((id: string | null) => {
    const url = new URL(window.location.href);
    if (id) url.searchParams.set("entry", id);
    else url.searchParams.delete("entry");
    window.history.pushState(null, "", url.toString());
    setEntryId(id);
    window.scrollTo({ top: 0 });
  }, []);

  const record = useCallback(
    async (rec: TechRecord, blob?: Blob) => {
      await addLocalRecord({ eventId, record: rec, now: Date.now(), ...(blob ? { blob } : {}) });
      await data.reloadLocal();
      void requestBackgroundSync();
      if (navigator.onLine) void outbox.drain();
    },
    [eventId, data, outbox],
  );

  const prepare = async () => {
    setPreparing(true);
    const result = await prepareForOffline(eventId, props.pagePaths);
    setPreparing(false);
    const packNow = result.pack.pack;
    setPrepareMessage(
      result.pack.message === null && packNow
        ? `Ready for offline: ${packNow.entries.length} cars in the event pack, ${result.pagesSaved} ${result.pagesSaved === 1 ? "page" : "pages"} saved on this phone.`
        : result.pack.message,
    );
  };

  const rows = useMemo(() => {
    const { pack, ruleSet } = data;
    if (!pack || !ruleSet) return [];
    return pack.entries.map((entry) => {
      const server = pack.verdicts.find((v) => v.entryId === entry.entryId);
      const hasLocal = data.local.some((l) => l.record.entryId === entry.entryId && isPending(l));
      const preview = hasLocal
        ? previewVerdict({
            ruleSet,
            entry,
            records: mergeEntryRecords(entry.entryId, pack.records, data.local),
            eventDate: pack.event.eventDate,
            unitSystem: pack.event.unitSystem,
          })
        : null;
      const status = preview?.status ?? server?.status ?? "waiting";
      const classId = preview?.classId ?? server?.classId ?? null;
      return {
        entryId: entry.entryId,
        carNumber: entry.carNumber,
        declaredClass:
          ruleSet.classes.find((c) => c.id === entry.declaredClassId)?.name ??
          entry.declaredClassId,
        finalClass:
          status === "moved-up"
            ? (ruleSet.classes.find((c) => c.id === classId)?.name ?? classId)
            : null,
        car: `${entry.car} · ${entry.colour}`,
        drivers: entry.drivers,
        status,
        reason: preview ? `Preview: ${preview.reason}` : (server?.reason ?? null),
        needsChief: server?.needsChief ?? false,
      };
    });
  }, [data]);

  if (data.loading || !deviceId) return <p className="card">Opening the tech line…</p>;
  const { pack, ruleSet } = data;
  const packRecord = (id: string) => {
    const raw = pack?.records.find((r) => r.id === id);
    const parsed = raw ? recordSchema.safeParse(raw) : null;
    return parsed?.success ? parsed.data : undefined;
  };
  const fetchNote = data.lastFetch?.message ?? null;
  const header = (
    <div className="space-y-3">
      {/* On a car card the screen is for that car: the pack's state waits on the list. */}
      {entryId && pack ? null : (
        <PackStatus
          pack={pack}
          preparing={preparing}
          message={prepareMessage ?? fetchNote}
          onPrepare={() => void prepare()}
        />
      )}
      <OutboxPanel
        local={data.local}
        online={outbox.online}
        running={outbox.running}
        onSendNow={() => void outbox.sendNow()}
        carNumberOf={(id) => pack?.entries.find((e) => e.entryId === id)?.carNumber}
        unitSystem={pack?.event.unitSystem ?? "mm"}
        itemLabel={(id) => ruleSet?.safety.checklist.find((i) => i.id === id)?.label}
        className={(id) => ruleSet?.classes.find((c) => c.id === id)?.name}
        findRecord={(id) => data.local.find((l) => l.record.id === id)?.record ?? packRecord(id)}
      />
    </div>
  );
  if (!pack || !ruleSet) return header;
  const context: TechContextValue = {
    eventId,
    official: props.official,
    deviceId,
    canWrite: props.canWrite,
    canChief: props.canChief,
    pack,
    ruleSet,
    local: data.local,
    record,
  };
  return (
    <TechContext.Provider value={context}>
      <div className="space-y-4">
        {header}
        {entryId ? (
          <CarCard entryId={entryId} onBack={() => open(null)} />
        ) : (
          <>
            <FindCar pack={pack} onOpen={open} />
            <StatusCounts rows={rows} />
            <EntryList rows={rows} onSelect={open} />
          </>
        )}
      </div>
    </TechContext.Provider>
  );
}
