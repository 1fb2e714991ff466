"use client";
import { useEffect, useState } from "react";
import { loadPhotoBlob } from "@/lib/offline/load-photo-blob";
import { makeRecord } from "@/lib/offline/make-record";
import type { TechRecord } from "@/lib/scrutineer/record-schema";
import { photoStorageKey } from "@/lib/tech/photo-storage-key";
import { shrinkPhoto } from "./shrink-photo";
import { useTech } from "./tech-context";

type Photo = Extract<TechRecord, { kind: "photo" }>;
type Note = Extract<TechRecord, { kind: "note" }>;

/** Photos taken with the phone camera and notes on the car; kept on the phone until sent. */
export function PhotosNotesPanel({ entryId, records }: { entryId: string; records: TechRecord[] }) {
  const { eventId, official, deviceId, record, canWrite } = useTech();
  const [caption, setCaption] = useState("");
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const photos = records.filter((r): r is Photo => r.kind === "photo");
  const notes = records.filter((r): r is Note => r.kind === "note");

  const addPhoto = async (file: File | undefined) => {
    if (!file) return;
    setBusy(true);
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
    await record(photo, await shrinkPhoto(file));
    setCaption("");
    setBusy(false);
  };

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
          onChange={(e) => setCaption(e.target.value)}
          placeholder="e.g. wing end plate, left"
        />
      </label>
      <label className={`btn-secondary w-full ${canWrite ? "" : "pointer-events-none opacity-60"}`}>
        {busy ? "Saving photo…" : "Take a photo"}
        <input
          type="file"
          accept="image/*"
          capture="environment"
          className="sr-only"
          onChange={(e) => void addPhoto(e.target.files?.[0])}
          data-testid="photo-input"
          disabled={!canWrite}
        />
      </label>
      {photos.length > 0 ? (
        <ul className="grid grid-cols-3 gap-2" data-testid="photo-list">
          {photos.map((p) => (
            <PhotoThumb key={p.id} photo={p} />
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
            maxLength={4000}
          />
        </label>
        <button type="submit" className="btn-secondary" disabled={!canWrite || !note.trim()}>
          Save note
        </button>
      </form>
      {notes.length > 0 ? (
        <ul className="space-y-1">
          {notes.map((n) => (
            <li key={n.id} className="rounded bg-asphalt-100 p-2 text-base">
              {n.payload.text}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}

function PhotoThumb({ photo }: { photo: Photo }) {
  const { eventId, local } = useTech();
  const [src, setSrc] = useState<string | null>(null);
  const isLocal = local.some((l) => l.record.id === photo.id && l.blob !== "uploaded");
  useEffect(() => {
    let url: string | null = null;
    let alive = true;
    (async () => {
      if (isLocal) {
        const blob = await loadPhotoBlob(photo.id);
        if (blob && alive) {
          url = URL.createObjectURL(blob);
          setSrc(url);
        }
      } else {
        setSrc(`/api/events/${eventId}/photos/${photo.id}?entry=${photo.entryId}`);
      }
    })();
    return () => {
      alive = false;
      if (url) URL.revokeObjectURL(url);
    };
  }, [eventId, isLocal, photo.id, photo.entryId]);
  return (
    <li className="overflow-hidden rounded-lg border border-asphalt-300 bg-asphalt-100">
      {src ? (
        // biome-ignore lint/performance/noImgElement: a blob: URL of a photo still on this phone; next/image cannot load it
        <img
          src={src}
          alt={photo.payload.caption ?? "Tech-line photo"}
          className="aspect-square w-full object-cover"
        />
      ) : (
        <div className="aspect-square" />
      )}
      {photo.payload.caption ? <p className="p-1 text-sm">{photo.payload.caption}</p> : null}
    </li>
  );
}
