"use client";
import { useCallback, useState } from "react";
import type { StoredPack } from "@/lib/offline/save-event-pack";
import { verifyPass } from "@/lib/offline/verify-pass";
import { extractPassToken } from "@/lib/passes/pass-url";
import { PassScanner } from "./pass-scanner";

/**
 * Find a car by scanning its pass (verified on the phone with the event pack's public key, no
 * network) or by typing its number or pass code.
 */
export function FindCar({ pack, onOpen }: { pack: StoredPack; onOpen: (entryId: string) => void }) {
  const [scanning, setScanning] = useState(false);
  const [typed, setTyped] = useState("");
  const [refusal, setRefusal] = useState<string | null>(null);

  const checkPass = useCallback(
    async (text: string) => {
      setScanning(false);
      const token = extractPassToken(text);
      if (!token) {
        setRefusal("That code is not a Plumbline pass. Scan again, or type the car number.");
        return;
      }
      let result: Awaited<ReturnType<typeof verifyPass>>;
      try {
        result = await verifyPass({
          token,
          eventId: pack.event.id,
          keys: pack.passKeys,
          revokedPassIds: pack.revokedPassIds,
          now: new Date(),
        });
      } catch {
        setRefusal(
          "This browser cannot check pass signatures here (it needs a secure page). Type the car number instead.",
        );
        return;
      }
      if (!result.ok) {
        setRefusal(result.message);
        return;
      }
      const entry = pack.entries.find((e) => e.entryId === result.claims.ent);
      if (!entry) {
        setRefusal(
          "The pass is genuine but this car is not in the event pack. Refresh the pack when you have signal.",
        );
        return;
      }
      if (entry.carNumber !== result.claims.car) {
        setRefusal(
          `This pass says car ${result.claims.car} but the entry is now car ${entry.carNumber}. Ask the entrant to open their pass again.`,
        );
        return;
      }
      setRefusal(null);
      onOpen(entry.entryId);
    },
    [pack, onOpen],
  );

  const openTyped = () => {
    const text = typed.trim();
    if (/^\d{1,4}$/.test(text)) {
      const entry = pack.entries.find((e) => e.carNumber === Number(text));
      if (entry) {
        setRefusal(null);
        onOpen(entry.entryId);
      } else setRefusal(`No car number ${text} in this event.`);
      return;
    }
    void checkPass(text);
  };

  return (
    <section className="space-y-3" aria-label="Find a car">
      {scanning ? (
        <PassScanner onText={checkPass} onClose={() => setScanning(false)} />
      ) : (
        <button
          type="button"
          className="btn-primary min-h-16 w-full text-xl"
          onClick={() => setScanning(true)}
        >
          Scan a pass
        </button>
      )}
      <form
        className="flex gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          openTyped();
        }}
      >
        <label className="sr-only" htmlFor="find-car-input">
          Car number or pass code
        </label>
        <input
          id="find-car-input"
          className="field-input mt-0"
          placeholder="Car number or pass code"
          value={typed}
          onChange={(e) => setTyped(e.target.value)}
          autoComplete="off"
          data-testid="find-car-input"
        />
        <button type="submit" className="btn-secondary">
          Open
        </button>
      </form>
      {refusal ? (
        <p
          className="rounded-lg border-2 border-stopped-line bg-stopped-soft p-3 text-lg font-semibold text-stopped"
          role="alert"
          data-testid="pass-refusal"
        >
          {refusal}
        </p>
      ) : null}
    </section>
  );
}
