import type { HttpSession } from "../support/http-session";

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
 * Submit a page's form as a browser does before its scripts load: the form (found by a marker in
 * its opening tag, e.g. `aria-labelledby="signup-pw-title"`) carries its server action's hidden
 * fields, and a multipart POST of them with ours runs the action. 303 on a redirect, else 200
 * with the page showing the action's words.
 */
export async function submitPageForm(
  session: HttpSession,
  page: string,
  marker: string,
  fields: Record<string, string>,
  headers: Record<string, string> = {},
): Promise<Response> {
  const html = await (await session.fetch(page, { headers })).text();
  const form = html.match(/<form[^>]*>[\s\S]*?<\/form>/g)?.find((f) => f.includes(marker));
  if (!form) throw new Error(`no form ${marker} on ${page}`);
  const body = new FormData();
  for (const [input] of form.matchAll(/<input[^>]*type="hidden"[^>]*>/g)) {
    const name = input.match(/name="([^"]*)"/)?.[1];
    if (name) body.append(decodeHtml(name), decodeHtml(input.match(/value="([^"]*)"/)?.[1] ?? ""));
  }
  for (const [name, value] of Object.entries(fields)) body.set(name, value);
  return session.fetch(page, {
    method: "POST",
    body,
    headers: { origin: new URL(session.baseUrl).origin, ...headers },
  });
}
