import { NextResponse } from "next/server";
import { z } from "zod";
import { isDatabaseUnavailable } from "../../db/database-unavailable";
import { AppError } from "../errors";
import { zodFieldErrors } from "./zod-field-errors";

/**
 * An error as an HTTP answer: AppError → its status with a message safe to show (and
 * Retry-After where it has one); zod failures → 422 with field-level messages; the database away
 * (restarting, or a lock conflict that outlasted its retries) → 503 with Retry-After; anything
 * else is logged and answered generically (no internals leak).
 */
export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    const headers: Record<string, string> = { "cache-control": "no-store" };
    if (error.retryAfterSeconds !== undefined) {
      headers["retry-after"] = String(Math.max(1, Math.ceil(error.retryAfterSeconds)));
    }
    return NextResponse.json(
      { error: { code: error.code, message: error.message, fields: error.fields } },
      { status: error.status, headers },
    );
  }
  if (error instanceof z.ZodError) {
    return NextResponse.json(
      {
        error: {
          code: "invalid_input",
          message: "Some fields need attention.",
          fields: zodFieldErrors(error),
        },
      },
      { status: 422 },
    );
  }
  if (isDatabaseUnavailable(error)) {
    console.error("[route] database unavailable", error);
    return NextResponse.json(
      {
        error: {
          code: "unavailable",
          message:
            "The server cannot reach its database just now. Nothing was lost: try again shortly.",
        },
      },
      { status: 503, headers: { "cache-control": "no-store", "retry-after": "2" } },
    );
  }
  console.error("[route] unexpected error", error);
  return NextResponse.json(
    { error: { code: "internal", message: "Something went wrong on our side. Try again." } },
    { status: 500 },
  );
}
