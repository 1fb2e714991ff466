/** The sign-in link e-mail, in plain words. Pure: returns subject, text and HTML. */
export function composeSignInMail(opts: { url: string; host: string; validMinutes: number }) {
  const subject = "Your Plumbline sign-in link";
  const text = [
    "Here is your link to sign in to Plumbline:",
    "",
    opts.url,
    "",
    `It works once and for ${opts.validMinutes} minutes. If you did not ask for it, ignore this e-mail.`,
    `Sent by ${opts.host}.`,
  ].join("\n");
  const safeUrl = escapeHtml(opts.url);
  const html = `<!doctype html><html><body style="font-family:sans-serif;font-size:18px;color:#111">
<p>Here is your link to sign in to Plumbline:</p>
<p><a href="${safeUrl}" style="display:inline-block;padding:14px 22px;background:#0b5c8e;color:#fff;text-decoration:none;border-radius:8px">Sign in to Plumbline</a></p>
<p style="font-size:15px">It works once and for ${opts.validMinutes} minutes. If you did not ask for it, ignore this e-mail.</p>
</body></html>`;
  return { subject, text, html };
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
