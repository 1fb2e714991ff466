// The fake payments service's hosted checkout page: what the entrant sees between Plumbline's
// "Pay" and coming back. Plain HTML with three buttons; no script.

type PageSession = { id: string; amount_total: number; currency: string; description: string };

/** The hosted checkout page for one open session. */
export function checkoutPageHtml(session: PageSession): string {
  const amount = new Intl.NumberFormat("en-GB", {
    style: "currency",
    currency: session.currency.toUpperCase(),
  }).format(session.amount_total / 100);
  const action = (what: string) => `/checkout/${encodeURIComponent(session.id)}/${what}`;
  return page(
    "Checkout",
    `<p class="small">Local test payments — no real card is charged</p>
<h1>Pay ${escapeHtml(amount)}</h1>
<p>${escapeHtml(session.description)}</p>
<form method="post" action="${action("pay")}"><button class="pay" type="submit">Pay ${escapeHtml(amount)}</button></form>
<form method="post" action="${action("decline")}"><button type="submit">Pay with a card that is declined</button></form>
<form method="post" action="${action("cancel")}"><button class="quiet" type="submit">Cancel and go back</button></form>`,
  );
}

/** A page saying why this session cannot be paid any more. */
export function closedPageHtml(words: string): string {
  return page("Checkout closed", `<h1>Checkout closed</h1><p>${escapeHtml(words)}</p>`);
}

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>${title}</title>
<style>body{font-family:sans-serif;margin:0;padding:24px;background:#eef0f3;color:#111;font-size:18px}
main{max-width:420px;margin:0 auto;background:#fff;border-radius:12px;padding:24px}
.small{font-size:14px;color:#444}h1{font-size:28px}button{display:block;width:100%;min-height:52px;
margin:12px 0;font-size:18px;border-radius:8px;border:2px solid #333;background:#fff}
.pay{background:#1d4f91;color:#fff;border-color:#1d4f91;font-weight:700}.quiet{border-color:#999}</style>
</head><body><main>${body}</main></body></html>`;
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
