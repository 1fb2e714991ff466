import type { FieldErrors } from "@/lib/errors";

/** What a form's server action answers: nothing yet, a refusal in words, or done. */
export type FormState = {
  status: "idle" | "error" | "done";
  message?: string;
  fields?: FieldErrors;
};
