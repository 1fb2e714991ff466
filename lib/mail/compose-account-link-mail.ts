import { renderMail } from "./render-mail";

/**
 * The account e-mail, sent whenever someone asks to create an account with an address. Pure.
 * - `new`: the address is confirmed and the person signed in by the link, which then opens
 *   their profile.
 * - `existing`: the address already has an account, so nothing was created; its owner is told and
 *   pointed to sign-in. (The page says the same thing in both cases, so it never tells a stranger
 *   which addresses have accounts.)
 */
export function composeAccountLinkMail(
  opts:
    | { kind: "new"; fullName: string; url: string; validHours: number; withPassword: boolean }
    | { kind: "existing"; signInUrl: string },
) {
  if (opts.kind === "existing") {
    return renderMail({
      subject: "You already have a Plumbline account",
      heading: "You already have an account",
      paragraphs: [
        "Someone (we hope you) asked to create a Plumbline account with this e-mail address. There is already an account for it, so nothing was created or changed.",
        "To use your account, sign in with your password or ask for a sign-in link.",
      ],
      action: { label: "Sign in to Plumbline", url: opts.signInUrl },
      footnote: "If you did not ask for this, you can ignore this e-mail.",
    });
  }
  return renderMail({
    subject: "Confirm your Plumbline account",
    heading: `Welcome to Plumbline, ${opts.fullName}`,
    paragraphs: [
      "Someone (we hope you) asked to create a Plumbline account with this e-mail address.",
      `Open the link to confirm the address and sign in. You will land on your profile, where you give your date of birth, phone, emergency contact and experience, which an event needs before you enter.${opts.withPassword ? " After that you can also sign in with the password you chose." : ""}`,
    ],
    action: { label: "Confirm and sign in", url: opts.url },
    footnote: `The link works once and for ${opts.validHours} hours. If you did not ask for an account, do not open it; ignore this e-mail and nothing more happens.`,
  });
}
