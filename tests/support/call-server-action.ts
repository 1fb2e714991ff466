import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import type { HttpSession } from "./http-session";
import { testDistDir } from "./test-env";

type Manifest = { node: Record<string, { filename: string; exportedName: string }> };

/** Every server action the test build has, as `file#export` → its action id. */
export function listServerActions(): Map<string, string> {
  const file = path.resolve(testDistDir, "server/server-reference-manifest.json");
  const manifest = JSON.parse(readFileSync(file, "utf8")) as Manifest;
  return new Map(
    Object.entries(manifest.node).map(([id, v]) => [`${v.filename}#${v.exportedName}`, id]),
  );
}

// React's own encoder for server action arguments, as the browser uses it (shipped inside next).
const require = createRequire(import.meta.url);
const { encodeReply } = require("next/dist/compiled/react-server-dom-webpack/client.edge") as {
  encodeReply: (value: unknown) => Promise<FormData | string>;
};

/**
 * Call a server action over HTTP as the page's form would: POST to the page with the
 * `Next-Action` header and the arguments encoded by React (`[state, form]`, or `[form]` for a
 * plain form action).
 */
export async function callServerAction(
  session: HttpSession,
  opts: {
    action: string;
    page: string;
    fields: Record<string, string | Blob>;
    state?: unknown;
    origin?: string;
  },
): Promise<{ status: number; text: string }> {
  const id = listServerActions().get(opts.action);
  if (!id) throw new Error(`no server action ${opts.action} in the build`);
  const form = new FormData();
  for (const [k, v] of Object.entries(opts.fields)) form.set(k, v);
  const body = await encodeReply(opts.state === undefined ? [form] : [opts.state, form]);
  const response = await session.fetch(opts.page, {
    method: "POST",
    headers: {
      "next-action": id,
      accept: "text/x-component",
      origin: opts.origin ?? new URL(session.baseUrl).origin,
    },
    body,
  });
  return { status: response.status, text: await response.text() };
}

/**
 * What an action's answer amounts to, as an HTTP status: a redirect keeps its status; a state
 * saying "Sign in first." is 401 and one saying the role does not allow it is 403; any other
 * answer is 200.
 */
export function actionOutcome({ status, text }: { status: number; text: string }): number {
  if (status !== 200) return status;
  if (text.includes("Sign in first.")) return 401;
  if (text.includes("does not allow that")) return 403;
  return 200;
}
