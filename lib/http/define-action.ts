import "server-only";
import { headers } from "next/headers";
import type { z } from "zod";
import { authorizeAccess, type Caller, type SignedInCaller } from "../auth/authorize-access";
import { getSessionUser } from "../auth/get-session-user";
import type { Permission } from "../auth/permissions";
import type { RouteAccess } from "../auth/route-access";
import { env } from "../env";
import { AppError, type FieldErrors } from "../errors";
import { checkOrigin } from "./check-origin";
import { zodFieldErrors } from "./zod-field-errors";

/** What every form's state can say when the action refuses: a message and field messages. */
export type ActionRefusal = { message: string; fields?: FieldErrors };

type CallerFor<A> = A extends { public: string } ? Caller : SignedInCaller;

/** Access for an action: as for a route, but the event may be found by a lookup (a pass's). */
type ActionAccess<I> =
  | RouteAccess<I>
  | { permission: Permission; eventIdFrom: (input: I) => Promise<string> };

type ActionSpec<S extends z.ZodType, State, A extends ActionAccess<z.infer<S>>> = {
  /** The form's fields this action reads, checked by `schema`. */
  fields: readonly string[];
  schema: S;
  access: A;
  /** How a refusal (bad input, not allowed, not found) reads in this form's state; the form is
   * there to echo what the person typed. */
  refuse: (refusal: ActionRefusal, form: FormData) => State;
  handler: (input: z.infer<S>, caller: CallerFor<A>) => Promise<State>;
};

/**
 * The one wrapper for server actions, the action form of `defineRoute`: the request checked to
 * come from Plumbline's own origin, the caller checked to be signed in (unless the action is
 * public), the form's fields parsed with zod, the caller authorized for the event the form
 * names, then the handler. Bad input, a missing sign-in, a missing permission and any AppError come
 * back as the form's state (words, field messages); Next's redirects and anything unexpected are
 * rethrown. The body is capped before it is read by proxy.ts (by path) and by Next's
 * `serverActions.bodySizeLimit`.
 */
export function defineAction<S extends z.ZodType, State, A extends ActionAccess<z.infer<S>>>(
  spec: ActionSpec<S, State, A>,
): (state: State, form: FormData) => Promise<State> {
  const appOrigin = new URL(env.APP_URL).origin;
  return async (_state, form) => {
    // Arguments come from the client: a hand-made request can send anything in the form's place.
    if (!(form instanceof FormData)) {
      return spec.refuse({ message: "The form could not be read; send it again." }, new FormData());
    }
    try {
      const requestHeaders = await headers();
      checkOrigin(
        new Request(env.APP_URL, { method: "POST", headers: new Headers(requestHeaders) }),
        appOrigin,
      );
      // Signed in first where it is needed: a signed-out caller learns nothing from the form's
      // checks (the event the form names is known only once it is parsed).
      if (!("public" in spec.access) && !(await getSessionUser())) {
        throw new AppError("unauthenticated", "Sign in first.");
      }
      const raw = Object.fromEntries(
        spec.fields.map((name) => [name, form.get(name) ?? undefined]),
      );
      const parsed = spec.schema.safeParse(raw);
      if (!parsed.success) {
        return spec.refuse(
          { message: "Some fields need attention.", fields: zodFieldErrors(parsed.error) },
          form,
        );
      }
      const input = parsed.data as z.infer<S>;
      const caller = await authorize(spec.access, input);
      return await spec.handler(input, caller as CallerFor<A>);
    } catch (error) {
      if (error instanceof AppError) {
        return spec.refuse({ message: error.message, fields: error.fields }, form);
      }
      throw error;
    }
  };
}

async function authorize<I>(access: ActionAccess<I>, input: I): Promise<Caller> {
  if ("eventIdFrom" in access) {
    const eventId = await access.eventIdFrom(input);
    return authorizeAccess({ permission: access.permission, eventId: () => eventId }, input);
  }
  return authorizeAccess(access as RouteAccess<I>, input);
}
