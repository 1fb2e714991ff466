"use client";
import { useMemo, useState } from "react";
import { makeRecord } from "@/lib/offline/make-record";
import { RECORD_TEXT_LIMITS, type TechRecord } from "@/lib/scrutineer/records/record-schema";
import { resolveVoids } from "@/lib/scrutineer/records/resolve-voids";
import { photoStorageKey } from "@/lib/tech/photo-storage-key";
import { CharacterCount } from "./character-count";
import { PhotoThumb } from "./photo-thumb";
import { preparePhoto } from "./prepare-photo";
import { recordByline } from "./record-byline";
import { useTech } from "./tech-context";
import { VoidOwnRecord } from "./void-own-record";

type Photo = Extract<TechRecord, { kind: "photo" }>;
type Note = Extract<TechRecord, { kind: "note" }>;

/** Photos taken with the camera and notes on the car, each with who and when; kept on the device until sent. */
export function PhotosNotesPanel({ entryId, records }: { entryId: string; records: TechRecord[] }) {
  const { eventId, pack, official, deviceId, record, canWrite } = useTech();
  const [caption, setCaption] = useState("");
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [photoError, setPhotoError] = useState<string | null>(null);
  // The engine's void rule: a void that was itself voided no longer hides its photo or note.
  const { voidedBy: voids } = useMemo(() => resolveVoids(records), [records]);
  const photos = records.filter((r): r is Photo => r.kind === "photo" && !voids.has(r.id));
  const notes = records.filter((r): r is Note => r.kind === "note");
  const byline = (r: TechRecord) =>
    recordByline({
      officialId: r.officialId,
      deviceTime: r.deviceTime,
      me: official.id,
      officials: pack.officials,
      timeZone: pack.event.timeZone,
    });

  const addPhoto = async (input: HTMLInputElement) => {
    const file = input.files?.[0];
    if (!file) return;
    setBusy(true);
    const prepared = await preparePhoto(file);
    input.value = "";
    if (!prepared.ok) {
      setPhotoError(prepared.message);
      setBusy(false);
      return;
    }
    setPhotoError(null);
    const now = new Date();
    const draft = makeRecord({
      kind: "photo",
      payload: { storageKey: "pending", ...(caption.trim() ? { caption: caption.trim() } : {}) },
      entryId,
      officialId: official.id,
      deviceId,
      now,
    });
    const photo: Photo = {
      ...draft,
      payload: {
        ...draft.payload,
        storageKey: photoStorageKey({ eventId, entryId, recordId: draft.id }),
      },
    };
    await record(photo, prepared.blob);
    setCaption("");
    setBusy(false);
  };

  const captionMax = RECORD_TEXT_LIMITS.photoCaption;
  const noteMax = RECORD_TEXT_LIMITS.note;
  return (
    <section className="space-y-3" aria-labelledby="photos-title">
      <h2 id="photos-title" className="text-2xl font-bold">
        Photos and notes
      </h2>
      <label className="block">
        <span className="field-label">Caption for the next photo</span>
        <input
          className="field-input"
          value={caption}
          maxLength={captionMax}
          aria-describedby="caption-count"
          onChange={(e) => setCaption(e.target.value)}
          placeholder="e.g. wing end plate, left"
        />
      </label>
      <CharacterCount id="caption-count" length={caption.length} max={captionMax} />
      <label className={`btn-secondary w-full ${canWrite ? "" : "pointer-events-none opacity-60"}`}>
        {busy ? "Saving photo…" : "Take a photo"}
        <input
          type="file"
          accept="image/*"
          capture="environment"
          className="sr-only"
          onChange={(e) => void addPhoto(e.currentTarget)}
          data-testid="photo-input"
          disabled={!canWrite}
        />
      </label>
      {photoError ? (
        <p className="field-error" role="alert" data-testid="photo-error">
          {photoError}
        </p>
      ) : null}
      {photos.length > 0 ? (
        <ul className="grid grid-cols-3 gap-2" data-testid="photo-list">
          {photos.map((p) => (
            <PhotoThumb key={p.id} photo={p} byline={byline(p)} />
          ))}
        </ul>
      ) : null}
      <form
        className="space-y-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (!note.trim()) return;
          void record(
            makeRecord({
              kind: "note",
              payload: { text: note.trim() },
              entryId,
              officialId: official.id,
              deviceId,
              now: new Date(),
            }),
          ).then(() => setNote(""));
        }}
      >
        <label className="block">
          <span className="field-label">Note</span>
          <textarea
            className="field-input min-h-24 py-2"
            value={note}
            onChange={(e) => setNote(e.target.value)}
            maxLength={noteMax}
            aria-describedby="note-count"
          />
        </label>
        <CharacterCount id="note-count" length={note.length} max={noteMax} />
        <button type="submit" className="btn-secondary" disabled={!canWrite || !note.trim()}>
          Save note
        </button>
      </form>
      {notes.length > 0 ? (
        <ul className="space-y-1" data-testid="note-list">
          {notes.map((n) => (
            <li key={n.id} className="space-y-1 rounded bg-asphalt-100 p-2 text-base">
              <p className={voids.has(n.id) ? "line-through opacity-70" : ""}>{n.payload.text}</p>
              <div className="flex flex-wrap items-center justify-between gap-2">
                <p className="text-sm text-asphalt-800" data-testid="note-byline">
                  {byline(n)}
                  {voids.has(n.id) ? ` · void: ${voids.get(n.id)?.payload.reason}` : ""}
                </p>
                {voids.has(n.id) ? null : <VoidOwnRecord target={n} what="your note" />}
              </div>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
