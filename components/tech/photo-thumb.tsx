"use client";
import { useEffect, useState } from "react";
import { loadPhotoBlob } from "@/lib/offline/load-photo-blob";
import type { TechRecordOf } from "@/lib/scrutineer/records/record-schema";
import { useTech } from "./tech-context";
import { VoidOwnRecord } from "./void-own-record";

/** One photo of the car: from the device until it is uploaded, then from the server. */
export function PhotoThumb({ photo, byline }: { photo: TechRecordOf<"photo">; byline: string }) {
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
        // biome-ignore lint/performance/noImgElement: a blob: URL of a photo still on this device; next/image cannot load it
        <img
          src={src}
          alt={photo.payload.caption ?? "Tech-line photo"}
          className="aspect-square w-full object-cover"
        />
      ) : (
        <div className="aspect-square" />
      )}
      <div className="space-y-1 p-1 text-sm">
        {photo.payload.caption ? <p>{photo.payload.caption}</p> : null}
        <p className="text-asphalt-800">{byline}</p>
        <VoidOwnRecord target={photo} what="your photo" />
      </div>
    </li>
  );
}
