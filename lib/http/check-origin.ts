import { AppError } from "../errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A write that carries the browser's cookies must come from Plumbline's own pages: its Origin
 * (or, failing that, its Referer) must be `appOrigin`. A request with neither header did not come
 * from a page in a browser (browsers send Origin on every cross-site POST), so it cannot be a
 * forged request riding on someone's cookies; it is let through to the permission check.
 */
export function checkOrigin(request: Request, appOrigin: string): void {
  if (SAFE_METHODS.has(request.method)) return;
  const origin = request.headers.get("origin");
  const referer = request.headers.get("referer");
  let from: string | null = null;
  if (origin !== null && origin !== "null") from = origin;
  else if (origin === "null") from = "null";
  else if (referer !== null) {
    try {
      from = new URL(referer).origin;
    } catch {
      from = "null";
    }
  }
  if (from !== null && from !== appOrigin) {
    throw new AppError("forbidden", "This request did not come from a Plumbline page.");
  }
}
