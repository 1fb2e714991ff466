import { renderMail } from "./render-mail";

/** The sign-in link e-mail, in plain words. Pure: returns subject, text and HTML. */
export function composeSignInMail(opts: { url: string; host: string; validMinutes: number }) {
  return renderMail({
    subject: "Your Plumbline sign-in link",
    heading: "Here is your link to sign in to Plumbline:",
    paragraphs: [],
    action: { label: "Sign in to Plumbline", url: opts.url },
    footnote: `It works once and for ${opts.validMinutes} minutes. If you did not ask for it, ignore this e-mail. Sent by ${opts.host}.`,
  });
}
