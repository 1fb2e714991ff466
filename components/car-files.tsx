"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { CAR_FILE_KINDS, type CarFileKind, MAX_CAR_FILE_BYTES } from "@/lib/cars/car-file-limits";
import type { Car, CarFileSummary } from "@/lib/cars/car-schema";
import type { FieldErrors } from "@/lib/errors";
import { garageKeys } from "@/lib/query/garage-queries";

const KINDS = Object.keys(CAR_FILE_KINDS) as CarFileKind[];
const MB = MAX_CAR_FILE_BYTES / 1024 / 1024;

async function sendFile(carId: string, kind: CarFileKind, file: File): Promise<CarFileSummary> {
  const form = new FormData();
  form.set("kind", kind);
  form.set("file", file);
  const response = await fetch(`/api/cars/${carId}/files`, { method: "POST", body: form });
  const body = (await response.json().catch(() => null)) as {
    file?: CarFileSummary;
    error?: { message?: string; fields?: FieldErrors };
  } | null;
  if (!response.ok || !body?.file) {
    throw new Error(body?.error?.message ?? `The file was not stored (${response.status}).`);
  }
  return body.file;
}

/** One slot: the current file (a thumbnail, or a link to a PDF) and a picker to add or replace. */
function FileSlot({ car, kind }: { car: Car; kind: CarFileKind }) {
  const queryClient = useQueryClient();
  const inputId = useId();
  const [tooBig, setTooBig] = useState<string | null>(null);
  const current = car.files.find((f) => f.kind === kind);
  const label = CAR_FILE_KINDS[kind];
  const mutation = useMutation({
    mutationFn: (file: File) => sendFile(car.id, kind, file),
    onSuccess: (file) =>
      queryClient.setQueryData<Car[]>(garageKeys.cars(), (old) =>
        (old ?? []).map((c) =>
          c.id === car.id ? { ...c, files: [...c.files.filter((f) => f.kind !== kind), file] } : c,
        ),
      ),
  });
  const problem = tooBig ?? (mutation.isError ? mutation.error.message : null);
  return (
    <li className="space-y-2" data-testid="car-file-slot" data-kind={kind}>
      <p className="text-base font-semibold">{label}</p>
      {current ? (
        current.contentType === "application/pdf" ? (
          <a href={current.url} className="btn-secondary w-full" target="_blank" rel="noreferrer">
            Open the dyno sheet (PDF)
          </a>
        ) : (
          <a href={current.url} target="_blank" rel="noreferrer">
            {/* biome-ignore lint/performance/noImgElement: served by our own authorised route */}
            <img
              src={current.url}
              alt={`${label} of the ${car.make} ${car.model}`}
              className="aspect-[4/3] w-full rounded-lg border border-asphalt-300 bg-asphalt-100 object-cover"
              data-testid="car-file-thumb"
              width={current.widthPx ?? undefined}
              height={current.heightPx ?? undefined}
            />
          </a>
        )
      ) : (
        <p className="flex aspect-[4/3] items-center justify-center rounded-lg border-2 border-dashed border-asphalt-400 text-base text-asphalt-700">
          None yet
        </p>
      )}
      <label htmlFor={inputId} className="btn-secondary w-full cursor-pointer">
        {mutation.isPending ? "Sending…" : current ? "Replace" : "Add"}
        <span className="sr-only">
          {" "}
          {label} of the {car.make} {car.model}
        </span>
      </label>
      <input
        id={inputId}
        type="file"
        className="sr-only"
        accept={
          kind === "dyno-sheet"
            ? "image/jpeg,image/png,image/webp,application/pdf"
            : "image/jpeg,image/png,image/webp"
        }
        data-testid={`car-file-input-${kind}`}
        disabled={mutation.isPending}
        onChange={(event) => {
          const file = event.target.files?.[0];
          event.target.value = "";
          if (!file) return;
          if (file.size > MAX_CAR_FILE_BYTES) {
            setTooBig(
              `That file is ${(file.size / 1024 / 1024).toFixed(1)} MB; the most is ${MB} MB.`,
            );
            return;
          }
          setTooBig(null);
          mutation.mutate(file);
        }}
      />
      {problem ? (
        <p className="field-error" role="alert" data-testid="car-file-error">
          {problem}
        </p>
      ) : null}
    </li>
  );
}

/** A car's photos (front, side, rear with the wing visible) and its dyno sheet: shown to the
 *  officials of the events it is entered in. Pictures are reduced to 1600 px on the server. */
export function CarFiles({ car }: { car: Car }) {
  return (
    <div className="space-y-2">
      <p className="text-base text-asphalt-800">
        Photos for the tech line: JPEG, PNG or WebP, up to {MB} MB each; the dyno sheet may be a
        PDF. The officials of the events you enter see them.
      </p>
      <ul className="grid grid-cols-2 gap-3" data-testid="car-files">
        {KINDS.map((kind) => (
          <FileSlot key={kind} car={car} kind={kind} />
        ))}
      </ul>
    </div>
  );
}
