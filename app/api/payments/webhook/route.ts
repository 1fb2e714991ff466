import { NextResponse } from "next/server";
import { defineRoute } from "@/lib/http/define-route";
import { BadWebhookSignature, handlePaymentWebhook } from "@/lib/payments/handle-payment-webhook";

export const dynamic = "force-dynamic";

// POST /api/payments/webhook — the payments service tells us how a checkout went. No session:
// the signature over the raw body (Stripe-Signature, checked by the SDK) is the guard.
export const POST = defineRoute({
  access: { public: "the payments service's webhook; its signature is checked before anything" },
  body: { raw: (bytes) => bytes, limit: "default" },
  handler: async (request, { body }) => {
    try {
      const outcome = await handlePaymentWebhook({
        body,
        signature: request.headers.get("stripe-signature"),
      });
      return NextResponse.json({ received: true, outcome });
    } catch (error) {
      if (!(error instanceof BadWebhookSignature)) throw error;
      console.warn(`[payments] webhook refused: ${error.message}`);
      return NextResponse.json(
        { error: "The webhook's signature did not verify." },
        { status: 400 },
      );
    }
  },
});
