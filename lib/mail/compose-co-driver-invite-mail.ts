import { renderMail } from "./render-mail";

/** The e-mail asking someone to co-drive an entered car; the link carries the token. Pure. */
export function composeCoDriverInviteMail(opts: {
  inviterName: string;
  eventName: string;
  eventDay: string;
  carNumber: number;
  car: string;
  className: string;
  inviteUrl: string;
  expiresDays: number;
}) {
  return renderMail({
    subject: `${opts.inviterName} asks you to co-drive car ${opts.carNumber} at ${opts.eventName}`,
    heading: "You are invited to co-drive",
    paragraphs: [
      `${opts.inviterName} has entered a ${opts.car} in ${opts.eventName} and asks you to share it as co-driver.`,
      "Open the link, sign in (or create an account) and give your own lap-time estimate and experience to accept. You can also decline.",
    ],
    details: [
      ["Event", `${opts.eventName}, ${opts.eventDay}`],
      ["Car", `${opts.carNumber} · ${opts.car}`],
      ["Class", opts.className],
    ],
    action: { label: "Answer the invitation", url: opts.inviteUrl },
    footnote: `The link works for ${opts.expiresDays} days and only once. If you did not expect this, ignore it.`,
  });
}
