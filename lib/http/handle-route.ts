import { NextResponse } from "next/server";
import { z } from "zod";
import { AppError } from "../errors";
import { zodFieldErrors } from "./zod-field-errors";

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wrap a route handler: AppError → its status with a safe message; zod failures → 422 with
 * field-level messages; anything else is logged and answered generically (no internals leak).
 */
export function handleRoute<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return NextResponse.json(
      { error: { code: error.code, message: error.message, fields: error.fields } },
      { status: error.status },
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
  console.error("[route] unexpected error", error);
  return NextResponse.json(
    { error: { code: "internal", message: "Something went wrong on our side. Try again." } },
    { status: 500 },
  );
}

/** Parse a JSON body with a zod schema; malformed JSON is a 422 too, not a 500. */
export async function parseJsonBody<T extends z.ZodType>(
  request: Request,
  schema: T,
): Promise<z.infer<T>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw new AppError("invalid_input", "The request body is not valid JSON.", {
      _: ["Send a JSON body."],
    });
  }
  return schema.parse(body);
}
