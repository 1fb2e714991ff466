import type { FieldErrors } from "../errors";

/** An error answer from one of our route handlers, with its field messages. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: FieldErrors | undefined,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/** fetch + JSON, turning our error envelope into an ApiError. */
export async function fetchJson<T>(url: string, init?: RequestInit): Promise<T> {
  const response = await fetch(url, {
    ...init,
    headers: { "content-type": "application/json", ...(init?.headers ?? {}) },
  });
  const body = (await response.json().catch(() => null)) as
    | (T & { error?: { message?: string; fields?: FieldErrors } })
    | null;
  if (!response.ok) {
    throw new ApiError(
      response.status,
      body?.error?.message ?? `Request failed (${response.status})`,
      body?.error?.fields,
    );
  }
  return body as T;
}
