import "server-only";
import type { z } from "zod";
import { authorizeAccess, type Caller, type SignedInCaller } from "../auth/authorize-access";
import type { RouteAccess } from "../auth/route-access";
import { env } from "../env";
import { AppError } from "../errors";
import { BODY_LIMITS, type BodyLimit } from "./body-limits";
import { checkOrigin } from "./check-origin";
import { errorResponse } from "./error-response";
import { readCappedBody } from "./read-capped-body";

type Input<P, Q> = { params: P; query: Q };

/** What a request may carry: a JSON body checked by a schema, a multipart form, bytes handed on
 * as they are (to a library that parses its own, like Auth.js), or nothing. */
type BodySpec<B> =
  | { json: z.ZodType<B>; limit: BodyLimit }
  | { form: (form: FormData) => B; limit: BodyLimit }
  | { raw: (bytes: Uint8Array) => B; limit: BodyLimit };

/** A public route may have no signed-in caller; every other kind has one. */
type CallerFor<A> = A extends { public: string } ? Caller : SignedInCaller;

type RouteSpec<P, Q, B, A extends RouteAccess<Input<P, Q>>> = {
  /** The path's dynamic segments, parsed (ids are UUIDs). */
  params?: z.ZodType<P>;
  /** The search string's values, parsed. */
  query?: z.ZodType<Q>;
  access: A;
  body?: BodySpec<B>;
  handler: (
    request: Request,
    input: Input<P, Q> & { body: B } & CallerFor<A>,
  ) => Promise<Response> | Response;
};

type NextContext = { params: Promise<unknown> };

/**
 * The one wrapper for route handlers. In order: path and query parsed (422), the caller
 * authorized (401 / 403), a cookie-carrying write checked to come from Plumbline's own origin
 * (403), the body refused unread when over its limit (413) or of the wrong type (415), parsed
 * with its zod schema (422), then the handler. Errors are answered by {@link errorResponse}:
 * typed ones with their status and words, anything else logged and answered 500 generically.
 */
export function defineRoute<
  A extends RouteAccess<Input<P, Q>>,
  P = Record<string, never>,
  Q = Record<string, never>,
  B = undefined,
>(spec: RouteSpec<P, Q, B, A>): (request: Request, context: NextContext) => Promise<Response> {
  const appOrigin = new URL(env.APP_URL).origin;
  return async (request, context) => {
    try {
      const rawParams = (await context?.params) ?? {};
      const params = (spec.params ? spec.params.parse(rawParams) : {}) as P;
      const search = Object.fromEntries(new URL(request.url).searchParams);
      const query = (spec.query ? spec.query.parse(search) : {}) as Q;
      const caller = await authorizeAccess(spec.access, { params, query });
      checkOrigin(request, appOrigin);
      const body = spec.body ? await readBody(request, spec.body) : (undefined as B);
      // authorizeAccess returns a signed-in caller for every access kind but `public`.
      const input = { params, query, body, ...caller } as Input<P, Q> & { body: B } & CallerFor<A>;
      return await spec.handler(request, input);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

async function readBody<B>(request: Request, spec: BodySpec<B>): Promise<B> {
  // The multipart boundary is case-sensitive: compare in lower case, parse with the original.
  const contentType = request.headers.get("content-type") ?? "";
  const type = contentType.toLowerCase();
  const limit = BODY_LIMITS[spec.limit];
  if ("raw" in spec) return spec.raw(await readCappedBody(request, limit));
  if ("json" in spec) {
    if (!type.startsWith("application/json")) {
      await request.body?.cancel().catch(() => undefined);
      throw new AppError("unsupported_media_type", "Send the request as JSON.");
    }
    const bytes = await readCappedBody(request, limit);
    let parsed: unknown;
    try {
      parsed = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
    } catch {
      throw new AppError("invalid_input", "The request body is not valid JSON.", {
        _: ["Send a JSON body."],
      });
    }
    return spec.json.parse(parsed);
  }
  if (!type.startsWith("multipart/form-data")) {
    await request.body?.cancel().catch(() => undefined);
    throw new AppError("unsupported_media_type", "Send the form as multipart form data.");
  }
  const bytes = await readCappedBody(request, limit);
  const form = await new Response(bytes as Uint8Array<ArrayBuffer>, {
    headers: { "content-type": contentType },
  })
    .formData()
    .catch(() => {
      throw new AppError("invalid_input", "The form could not be read.", {
        _: ["Send the form as multipart form data."],
      });
    });
  return spec.form(form);
}
