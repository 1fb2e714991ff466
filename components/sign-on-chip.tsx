import type { SignOnState } from "@/lib/entries/sign-on-state";
import { AttentionIcon, ClearedIcon } from "./icons/state-icons";

/** Sign-on state as word + icon + colour: "Signed on", or "Not signed on" with what is missing. */
export function SignOnChip({ signOn }: { signOn: SignOnState }) {
  if (signOn.signedOn) {
    return (
      <span
        className="inline-flex items-center gap-1.5 text-base font-semibold text-cleared"
        data-testid="sign-on"
        data-signed-on="true"
      >
        <ClearedIcon className="size-5 shrink-0" />
        Signed on
      </span>
    );
  }
  return (
    <span
      className="inline-flex items-start gap-1.5 text-base font-semibold text-attention"
      data-testid="sign-on"
      data-signed-on="false"
    >
      <AttentionIcon className="mt-0.5 size-5 shrink-0" />
      <span>Not signed on: {signOn.missing.join("; ").toLowerCase()}</span>
    </span>
  );
}
