import type { HttpSession } from "./http-session";

function decodeHtml(text: string): string {
  return text
    .replace(/&quot;/g, '"')
    .replace(/&#x27;/g, "'")
    .replace(/&#39;/g, "'")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&");
}

/**
 * Submit one of the sign-in page's forms the way a browser does before its scripts load: the
 * page renders each form with the hidden fields of its server action (`$ACTION_…`), and a
 * multipart POST of them runs the action (app/(auth)/sign-in/actions.ts). Answers 303 on a
 * redirect, or 200 with the page showing the action's message.
 */
export async function submitSignInForm(
  session: HttpSession,
  form: "link" | "password",
  fields: Record<string, string>,
  headers: Record<string, string> = {},
): Promise<Response> {
  const page = await (await session.fetch("/sign-in", { headers })).text();
  const marker = form === "link" ? 'aria-labelledby="link-title"' : 'aria-labelledby="pw-title"';
  const html = page.match(/<form[^>]*>[\s\S]*?<\/form>/g)?.find((f) => f.includes(marker));
  if (!html) throw new Error(`no ${form} form on /sign-in`);
  const body = new FormData();
  for (const [input] of html.matchAll(/<input[^>]*type="hidden"[^>]*>/g)) {
    const name = input.match(/name="([^"]*)"/)?.[1];
    if (name) body.append(decodeHtml(name), decodeHtml(input.match(/value="([^"]*)"/)?.[1] ?? ""));
  }
  for (const [name, value] of Object.entries(fields)) body.set(name, value);
  return session.fetch("/sign-in", {
    method: "POST",
    body,
    headers: { origin: new URL(session.baseUrl).origin, ...headers },
  });
}

/** The text of a rendered page, tags dropped, for finding the words a person reads. */
export function pageText(html: string): string {
  return decodeHtml(html.replace(/<script[\s\S]*?<\/script>/g, " ").replace(/<[^>]+>/g, " "))
    .replace(/\s+/g, " ")
    .trim();
}
