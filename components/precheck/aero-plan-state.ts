import type { FieldErrors } from "@/lib/errors";

/** What the pre-check's save and delete forms show after the server answers. */
export type AeroPlanState =
  | { status: "idle" }
  | { status: "done"; message: string }
  | { status: "error"; message: string; fields?: FieldErrors };
