import { describe, expect, it } from "vitest";
import { parseStripeForm } from "../../scripts/fakes/parse-stripe-form";

// The fake reads back what the SDK writes: stripe-node encodes nested objects as a[b]=v and
// arrays with indices, a[0][c]=v (node_modules/stripe/cjs/utils.js, stringifyRequestData).
describe("parseStripeForm", () => {
  it("reads nested objects and indexed arrays back", () => {
    const body =
      "mode=payment&line_items[0][quantity]=1&line_items[0][price_data][unit_amount]=8500" +
      "&line_items[0][price_data][currency]=gbp&metadata[entryId]=e1&success_url=http%3A%2F%2Fa%2Fb%3Fc%3Dd";
    expect(parseStripeForm(body)).toEqual({
      mode: "payment",
      line_items: [{ quantity: "1", price_data: { unit_amount: "8500", currency: "gbp" } }],
      metadata: { entryId: "e1" },
      success_url: "http://a/b?c=d",
    });
  });
});
