// A local stand-in for the hosted payments service, spoken to with the `stripe` SDK pointed at
// 127.0.0.1 (`new Stripe(key, { host, port, protocol: "http" })`). It answers the part of the
// API Plumbline uses — create / retrieve / expire Checkout Sessions, create refunds, retrieve
// events — serves the hosted checkout page (/checkout/<id>) with Pay / Decline / Cancel, and
// sends webhooks signed as the real service signs them (Stripe-Signature: t=…,v1=HMAC-SHA256 of
// "t.payload"), so `stripe.webhooks.constructEvent` verifies them.
// Sources for the shapes: https://docs.stripe.com/api/checkout/sessions/object,
// https://docs.stripe.com/api/refunds/object, https://docs.stripe.com/api/events/object,
// https://docs.stripe.com/webhooks#verify-manually.
import { randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import http from "node:http";
import path from "node:path";
import { parseStripeForm } from "./parse-stripe-form";
import { checkoutPageHtml, closedPageHtml } from "./payments-fake-page";
import { signWebhookPayload } from "./sign-webhook-payload";

export type PaymentsFake = { port: number; url: string; close: () => Promise<void> };

type Obj = Record<string, unknown> & { id: string };
type State = {
  sessions: Record<string, Obj>;
  intents: Record<string, Obj>;
  refunds: Record<string, Obj>;
  events: Record<string, Obj>;
  idempotent: Record<string, { status: number; body: unknown }>;
};

const API_VERSION = "2025-10-29.clover";
const DELIVERY_ATTEMPTS = 3;

/** Start the fake on 127.0.0.1:`port`; with `dir`, its state survives a restart (the demo). */
export async function startPaymentsFake(opts: {
  port: number;
  dir?: string;
  webhookUrl: string;
  webhookSecret: string;
}): Promise<PaymentsFake> {
  const stateFile = opts.dir ? path.join(opts.dir, "payments-state.json") : undefined;
  const state: State = loadState(stateFile);
  const save = () => {
    if (!stateFile) return;
    mkdirSync(path.dirname(stateFile), { recursive: true });
    writeFileSync(stateFile, JSON.stringify(state));
  };
  const base = `http://127.0.0.1:${opts.port}`;

  /** Send one event to the endpoint, signed afresh each attempt; true once it answers 2xx. */
  async function deliver(event: Obj): Promise<number> {
    const payload = JSON.stringify(event, null, 2);
    let status = 0;
    for (let attempt = 1; attempt <= DELIVERY_ATTEMPTS; attempt += 1) {
      const header = signWebhookPayload({
        payload,
        secret: opts.webhookSecret,
        timestampSeconds: Math.floor(Date.now() / 1000),
      });
      try {
        const res = await fetch(opts.webhookUrl, {
          method: "POST",
          headers: {
            "content-type": "application/json; charset=utf-8",
            "stripe-signature": header,
            "user-agent": "Stripe/1.0 (+https://stripe.com/docs/webhooks)",
          },
          body: payload,
          signal: AbortSignal.timeout(10_000),
        });
        status = res.status;
        await res.arrayBuffer();
        if (res.ok) return status;
      } catch {
        status = 0;
      }
      await new Promise((r) => setTimeout(r, 200 * attempt));
    }
    console.warn(`[payments-fake] webhook ${event.type} ${event.id} not accepted (${status})`);
    return status;
  }

  async function emit(type: string, object: Obj): Promise<void> {
    const event: Obj = {
      id: newId("evt"),
      object: "event",
      api_version: API_VERSION,
      created: nowSeconds(),
      data: { object: structuredClone(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    state.events[event.id] = event;
    save();
    await deliver(event);
  }

  async function api(method: string, url: URL, body: string): Promise<[number, unknown]> {
    const p = url.pathname;
    const form = parseStripeForm(body);
    if (method === "POST" && p === "/v1/checkout/sessions") return createSession(form);
    let m = p.match(/^\/v1\/checkout\/sessions\/([\w-]+)$/);
    if (method === "GET" && m) return found(state.sessions[m[1] as string], "checkout.session");
    m = p.match(/^\/v1\/checkout\/sessions\/([\w-]+)\/expire$/);
    if (method === "POST" && m) return expireSession(m[1] as string);
    if (method === "POST" && p === "/v1/refunds") return createRefund(form);
    if (method === "GET" && p === "/v1/refunds") {
      const pi = url.searchParams.get("payment_intent");
      const data = Object.values(state.refunds).filter((r) => !pi || r.payment_intent === pi);
      return [200, { object: "list", data, has_more: false, url: "/v1/refunds" }];
    }
    m = p.match(/^\/v1\/events\/([\w-]+)$/);
    if (method === "GET" && m) return found(state.events[m[1] as string], "event");
    return [404, apiError(`Unrecognized request URL (${method}: ${p}).`)];
  }

  function createSession(form: Record<string, unknown>): [number, unknown] {
    const items = (form.line_items ?? []) as Array<Record<string, unknown>>;
    if (!Array.isArray(items) || items.length === 0) {
      return [400, apiError("Missing required param: line_items.", "line_items")];
    }
    let amount = 0;
    let currency = "";
    let description = "";
    for (const item of items) {
      const price = (item.price_data ?? {}) as Record<string, unknown>;
      const unit = Number(price.unit_amount);
      const quantity = Number(item.quantity ?? 1);
      if (!Number.isInteger(unit) || unit < 0 || !Number.isInteger(quantity) || quantity < 1) {
        return [400, apiError("Invalid line_items: unit_amount and quantity must be integers.")];
      }
      if (typeof price.currency !== "string" || !/^[a-z]{3}$/.test(price.currency)) {
        return [400, apiError("Invalid currency.", "currency")];
      }
      amount += unit * quantity;
      currency = price.currency;
      const product = (price.product_data ?? {}) as Record<string, unknown>;
      description ||= String(product.name ?? "");
    }
    for (const key of ["success_url", "cancel_url"]) {
      if (typeof form[key] !== "string" || !URL.canParse(form[key] as string)) {
        return [400, apiError(`Invalid URL: ${key}.`, key)];
      }
    }
    const id = newId("cs_test");
    const session: Obj = {
      id,
      object: "checkout.session",
      amount_subtotal: amount,
      amount_total: amount,
      cancel_url: form.cancel_url,
      client_reference_id: form.client_reference_id ?? null,
      created: nowSeconds(),
      currency,
      customer_email: form.customer_email ?? null,
      expires_at: nowSeconds() + 24 * 3600,
      livemode: false,
      metadata: form.metadata ?? {},
      mode: form.mode ?? "payment",
      payment_intent: null,
      payment_status: "unpaid",
      status: "open",
      success_url: form.success_url,
      url: `${base}/checkout/${id}`,
      // Kept for the fake's own use (copied onto the payment intent, as the real service does).
      _payment_intent_data: form.payment_intent_data ?? {},
      _description: description,
    };
    state.sessions[id] = session;
    save();
    return [200, publicObject(session)];
  }

  async function expireSession(id: string): Promise<[number, unknown]> {
    const session = state.sessions[id];
    if (!session) return [404, apiError(`No such checkout.session: '${id}'`)];
    if (session.status !== "open") {
      return [400, apiError(`Only Checkout Sessions with a status in ["open"] can be expired.`)];
    }
    session.status = "expired";
    save();
    await emit("checkout.session.expired", publicObject(session));
    return [200, publicObject(session)];
  }

  function createRefund(form: Record<string, unknown>): [number, unknown] {
    const intent = state.intents[String(form.payment_intent ?? "")];
    if (!intent) return [404, apiError(`No such payment_intent: '${form.payment_intent}'`)];
    if (intent.status !== "succeeded") {
      return [400, apiError("This PaymentIntent does not have a successful charge to refund.")];
    }
    const refunded = Object.values(state.refunds)
      .filter((r) => r.payment_intent === intent.id)
      .reduce((sum, r) => sum + Number(r.amount), 0);
    const left = Number(intent.amount) - refunded;
    const amount = form.amount === undefined ? left : Number(form.amount);
    if (!Number.isInteger(amount) || amount < 1 || amount > left) {
      return [400, apiError(`Refund amount (${amount}) is greater than unrefunded amount.`)];
    }
    const refund: Obj = {
      id: newId("re"),
      object: "refund",
      amount,
      currency: intent.currency,
      created: nowSeconds(),
      metadata: form.metadata ?? {},
      payment_intent: intent.id,
      reason: form.reason ?? null,
      status: "succeeded",
    };
    state.refunds[refund.id] = refund;
    save();
    return [200, refund];
  }

  /** The checkout page's buttons. */
  async function checkoutAction(id: string, what: string): Promise<[number, string, string?]> {
    const session = state.sessions[id];
    if (!session) return [404, closedPageHtml("There is no such checkout.")];
    if (session.status !== "open") {
      return [410, closedPageHtml(`This checkout is ${session.status}; start again from the app.`)];
    }
    if (what === "cancel") return [303, "", String(session.cancel_url)];
    const piData = session._payment_intent_data as Record<string, unknown>;
    const intent: Obj = {
      id: newId("pi"),
      object: "payment_intent",
      amount: session.amount_total,
      currency: session.currency,
      created: nowSeconds(),
      metadata: piData.metadata ?? {},
      status: what === "pay" ? "succeeded" : "requires_payment_method",
      last_payment_error:
        what === "pay"
          ? null
          : {
              type: "card_error",
              code: "card_declined",
              decline_code: "generic_decline",
              message: "Your card was declined.",
            },
    };
    state.intents[intent.id] = intent;
    session.payment_intent = intent.id;
    if (what === "pay") {
      session.status = "complete";
      session.payment_status = "paid";
      save();
      // Delivered before the browser comes back, so the app knows by the time it shows the page.
      await emit("checkout.session.completed", publicObject(session));
      const back = String(session.success_url).replace("{CHECKOUT_SESSION_ID}", id);
      return [303, "", back];
    }
    save();
    await emit("payment_intent.payment_failed", intent);
    return [303, "", String(session.cancel_url)];
  }

  const server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size > 1_000_000) req.destroy();
      else chunks.push(c);
    });
    req.on("end", () => {
      void handle(req, Buffer.concat(chunks).toString("utf8"))
        .then(([status, type, body, location]) => {
          res.writeHead(status, {
            "content-type": type,
            ...(location ? { location } : {}),
            "request-id": newId("req"),
            // The checkout page is never kept: Back after paying shows where the checkout
            // stands now (paid), not a stale Pay button.
            "cache-control": "no-store",
          });
          res.end(body);
        })
        .catch((error: unknown) => {
          console.error("[payments-fake]", error);
          res.writeHead(500, { "content-type": "application/json" });
          res.end(JSON.stringify(apiError("The fake failed.")));
        });
    });
  });

  async function handle(
    req: http.IncomingMessage,
    body: string,
  ): Promise<[number, string, string, string?]> {
    const url = new URL(req.url ?? "/", base);
    const method = req.method ?? "GET";
    const html = "text/html; charset=utf-8";
    if (url.pathname.startsWith("/v1/")) {
      if (!/^Bearer sk_(test|live)_\w+/.test(req.headers.authorization ?? "")) {
        return [401, "application/json", JSON.stringify(apiError("Invalid API Key provided."))];
      }
      const key = req.headers["idempotency-key"];
      const kept = typeof key === "string" && method === "POST" ? state.idempotent[key] : undefined;
      const [status, out] = kept ? [kept.status, kept.body] : await api(method, url, body);
      if (typeof key === "string" && method === "POST" && !kept) {
        state.idempotent[key] = { status, body: out };
        save();
      }
      return [status, "application/json", JSON.stringify(out)];
    }
    const page = url.pathname.match(/^\/checkout\/([\w-]+)$/);
    if (method === "GET" && page) {
      const session = state.sessions[page[1] as string];
      if (!session) return [404, html, closedPageHtml("There is no such checkout.")];
      if (session.status !== "open") {
        return [410, html, closedPageHtml(`This checkout is ${session.status}.`)];
      }
      return [
        200,
        html,
        checkoutPageHtml({
          id: session.id,
          amount_total: Number(session.amount_total),
          currency: String(session.currency),
          description: String(session._description),
        }),
      ];
    }
    const button = url.pathname.match(/^\/checkout\/([\w-]+)\/(pay|decline|cancel)$/);
    if (method === "POST" && button) {
      const [status, out, location] = await checkoutAction(
        button[1] as string,
        button[2] as string,
      );
      return [status, html, out, location];
    }
    // The fake's own doors, for the tests: list events, deliver one again (as the service's
    // retries do: same event, signed anew).
    if (method === "GET" && url.pathname === "/_fake/events") {
      return [200, "application/json", JSON.stringify(Object.values(state.events))];
    }
    const again = url.pathname.match(/^\/_fake\/events\/([\w-]+)\/deliver$/);
    if (method === "POST" && again) {
      const event = state.events[again[1] as string];
      if (!event) return [404, "application/json", JSON.stringify(apiError("No such event."))];
      return [200, "application/json", JSON.stringify({ status: await deliver(event) })];
    }
    if (url.pathname === "/_fake/health") return [200, "text/plain", "ok"];
    return [404, "text/plain", "not found"];
  }

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  return {
    port: opts.port,
    url: base,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

function loadState(file: string | undefined): State {
  const empty: State = { sessions: {}, intents: {}, refunds: {}, events: {}, idempotent: {} };
  if (!file) return empty;
  try {
    return { ...empty, ...(JSON.parse(readFileSync(file, "utf8")) as Partial<State>) };
  } catch {
    return empty;
  }
}

function found(object: Obj | undefined, kind: string): [number, unknown] {
  return object ? [200, publicObject(object)] : [404, apiError(`No such ${kind}`)];
}

/** The object as the API shows it (without the fake's own `_` fields). */
function publicObject(object: Obj): Obj {
  return Object.fromEntries(Object.entries(object).filter(([k]) => !k.startsWith("_"))) as Obj;
}

function apiError(message: string, param?: string) {
  return { error: { type: "invalid_request_error", message, ...(param ? { param } : {}) } };
}

function newId(prefix: string): string {
  return `${prefix}_${randomBytes(12).toString("base64url").replace(/[-_]/g, "0")}`;
}

function nowSeconds(): number {
  return Math.floor(Date.now() / 1000);
}
