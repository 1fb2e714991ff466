import type { Permission } from "./permissions";

/**
 * Who may call a route handler or server action: every one of them names one of these, so none
 * can forget the guard.
 * - `public`: anyone, with the reason written down (the paddock board is the sheet on the wall);
 * - `signedIn`: any signed-in person, acting on their own things (their garage);
 * - `permission`: the permission in the event the request names;
 * - `entry`: the entry's own driver, co-driver or car owner, or an official who may read entries.
 */
export type RouteAccess<P> =
  | { public: string }
  | { signedIn: true }
  | { permission: Permission; eventId: (input: P) => string }
  | { entry: (input: P) => string };
