/** One step of an entry's checklist: its state in a word and whether it is done. */
export type ChecklistStep = {
  key: "declare" | "waiver" | "pay" | "co-driver" | "pass";
  title: string;
  state: "done" | "to-do" | "waiting" | "problem";
  words: string;
  /** Where the step is done; null when it is done on the entry page itself. */
  href: string | null;
};

type ChecklistFacts = {
  entryId: string;
  status: "entered" | "waiting" | "withdrawn";
  declared: boolean;
  drivers: Array<{ name: string; waiver: "signed" | "needs-guardian" | "missing" }>;
  payment: "pending" | "paid" | "failed" | "cancelled" | "refunded" | null;
  invite: { email: string; acceptedAt: Date | null; closedAt: Date | null; expiresAt: Date } | null;
  hasCoDriver: boolean;
  hasPass: boolean;
  now: Date;
};

const paymentWords: Record<
  NonNullable<ChecklistFacts["payment"]>,
  [ChecklistStep["state"], string]
> = {
  pending: ["waiting", "Payment started, not completed yet."],
  paid: ["done", "Paid."],
  failed: ["problem", "The payment was declined: the fee is still unpaid."],
  cancelled: ["problem", "The payment was cancelled: the fee is still unpaid."],
  refunded: ["done", "Refunded."],
};

/** The entrant's steps, each with its state as the tables say; pure. */
export function entryChecklistSteps(f: ChecklistFacts): ChecklistStep[] {
  const base = `/entries/${f.entryId}`;
  const waiverDone = f.drivers.every((d) => d.waiver === "signed");
  const waiverWords = f.drivers
    .map(
      (d) =>
        `${d.name}: ${d.waiver === "signed" ? "signed" : d.waiver === "needs-guardian" ? "waits for a parent or guardian" : "not signed"}`,
    )
    .join("; ");
  const [payState, payWords] = f.payment
    ? paymentWords[f.payment]
    : (["to-do", "Not paid yet."] as const);
  const inviteOpen =
    f.invite && !f.invite.acceptedAt && !f.invite.closedAt && f.invite.expiresAt > f.now;
  const coDriver: ChecklistStep = f.hasCoDriver
    ? { key: "co-driver", title: "Co-driver", state: "done", words: "Accepted.", href: null }
    : inviteOpen
      ? {
          key: "co-driver",
          title: "Co-driver (optional)",
          state: "waiting",
          words: `Invited ${f.invite?.email}; not answered yet.`,
          href: null,
        }
      : {
          key: "co-driver",
          title: "Co-driver (optional)",
          state: "to-do",
          words: f.invite
            ? `The invitation to ${f.invite.email} was ${f.invite.closedAt ? "declined or replaced" : "not answered in time"}.`
            : "None invited.",
          href: null,
        };
  return [
    {
      key: "declare",
      title: "Declare the car",
      state: f.declared ? "done" : "to-do",
      words: f.declared ? "Declarations stored." : "What the class asks for: not declared yet.",
      href: `${base}/declare`,
    },
    {
      key: "waiver",
      title: "Waiver (every driver)",
      state: waiverDone ? "done" : "to-do",
      words: waiverWords,
      href: `${base}/waiver`,
    },
    {
      key: "pay",
      title: "Entry fee",
      state: f.status === "waiting" && !f.payment ? "waiting" : payState,
      words:
        f.status === "waiting" && !f.payment ? "Pay once a place in the field is yours." : payWords,
      href: `${base}/pay`,
    },
    coDriver,
    {
      key: "pass",
      title: "Pass",
      state: f.hasPass ? "done" : "to-do",
      words: f.hasPass
        ? "Issued."
        : "Issued once the entry is in the field, every waiver is signed and the fee is paid.",
      href: `${base}/pass`,
    },
  ];
}
