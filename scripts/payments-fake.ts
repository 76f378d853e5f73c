// A local stand-in for the payment provider's API, for development and tests only. It speaks
// just the calls Fitframe makes through the official Stripe SDK (form-encoded requests, JSON
// answers, Bearer secret key): Checkout Sessions create/retrieve, PaymentIntents retrieve,
// Refunds create. A hosted "pay" page at session.url completes a payment; completing it (or
// refunding) POSTs a webhook event to the app, signed with the SDK's own test-header helper.
// Test hooks: POST /_test/checkout/sessions/{id}/complete, POST /_test/events/{id}/resend.
import { randomBytes } from "node:crypto";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import Stripe from "stripe";
import { env } from "../lib/config/env";

type Obj = Record<string, unknown>;
const config = env();
const port = config.PAYMENTS_PORT;
const webhookUrl = process.env.PAYMENTS_WEBHOOK_URL ?? `${config.NEXTAUTH_URL}/api/payments/webhook`;
const signer = new Stripe(config.STRIPE_SECRET_KEY).webhooks;

const sessions = new Map<string, Obj>();
const intents = new Map<string, Obj>();
const events = new Map<string, Obj>();
const idempotent = new Map<string, { status: number; body: Obj }>();
const newId = (prefix: string) => `${prefix}_fake_${randomBytes(10).toString("hex")}`;
const now = () => Math.floor(Date.now() / 1000);

/** `a[b][0][c]=v` → { a: { b: [ { c: "v" } ] } }, the way the SDK encodes nested params. */
function parseForm(text: string): Obj {
  const root: Obj = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const path = key.replace(/\]/g, "").split("[");
    let node = root;
    path.forEach((part, i) => {
      if (i === path.length - 1) node[part] = value;
      else node = (node[part] ??= {}) as Obj;
    });
  }
  const arrays = (v: unknown): unknown => {
    if (typeof v !== "object" || v === null) return v;
    const entries = Object.entries(v as Obj).map(([k, x]) => [k, arrays(x)] as const);
    return entries.length > 0 && entries.every(([k]) => /^\d+$/.test(k)) ? entries.map(([, x]) => x) : Object.fromEntries(entries);
  };
  return arrays(root) as Obj;
}

async function deliver(type: string, object: Obj, eventId = newId("evt")) {
  const event = events.get(eventId) ?? { id: eventId, object: "event", api_version: "2026-10-28.endive", created: now(), livemode: false, type, data: { object } };
  events.set(eventId, event);
  const payload = JSON.stringify(event);
  const res = await fetch(webhookUrl, {
    method: "POST",
    headers: { "content-type": "application/json", "stripe-signature": signer.generateTestHeaderString({ payload, secret: config.STRIPE_WEBHOOK_SECRET }) },
    body: payload,
  }).catch((err: Error) => ({ status: 0, text: async () => err.message }));
  return { eventId, status: res.status, answer: await res.text() };
}

async function completeSession(id: string) {
  const session = sessions.get(id);
  if (!session) return null;
  if (session.status !== "complete") {
    const intent = { id: newId("pi"), object: "payment_intent", amount: session.amount_total, amount_received: session.amount_total, currency: session.currency, status: "succeeded", metadata: session.metadata, latest_charge: newId("ch") };
    intents.set(intent.id, intent);
    Object.assign(session, { status: "complete", payment_status: "paid", payment_intent: intent.id });
  }
  return { session, delivery: await deliver("checkout.session.completed", session) };
}

function createSession(p: Obj) {
  const items = (p.line_items as Obj[] | undefined) ?? [];
  const amount = items.reduce((sum, item) => sum + Number((item.price_data as Obj | undefined)?.unit_amount ?? 0) * Number(item.quantity ?? 1), 0);
  const currency = (items[0]?.price_data as Obj | undefined)?.currency ?? "gbp";
  if (p.mode !== "payment" || !p.success_url || amount <= 0) return { status: 400, body: error("mode=payment, success_url and a priced line item are required") };
  const id = newId("cs");
  const session = {
    id, object: "checkout.session", mode: "payment", status: "open", payment_status: "unpaid", amount_total: amount, currency,
    metadata: p.metadata ?? {}, client_reference_id: p.client_reference_id ?? null, customer_email: p.customer_email ?? null,
    success_url: p.success_url, cancel_url: p.cancel_url ?? null, payment_intent: null, url: `http://127.0.0.1:${port}/pay/${id}`, created: now(),
  };
  sessions.set(id, session);
  return { status: 200, body: session };
}

function createRefund(p: Obj) {
  const intent = intents.get(String(p.payment_intent ?? ""));
  if (!intent || intent.status !== "succeeded") return { status: 400, body: error("No succeeded payment_intent to refund") };
  const refund = { id: newId("re"), object: "refund", amount: Number(p.amount ?? intent.amount), currency: intent.currency, payment_intent: intent.id, status: "succeeded", metadata: p.metadata ?? {}, created: now() };
  const charge = { id: intent.latest_charge, object: "charge", payment_intent: intent.id, amount: intent.amount, amount_refunded: refund.amount, refunded: refund.amount === intent.amount, currency: intent.currency, metadata: intent.metadata };
  // The provider reports the refund by webhook a moment after answering the call.
  setTimeout(() => void deliver("charge.refunded", charge), 50);
  return { status: 200, body: refund };
}

const error = (message: string, type = "invalid_request_error") => ({ error: { type, message } });

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

function send(res: ServerResponse, status: number, body: unknown, type = "application/json") {
  res.writeHead(status, { "content-type": type });
  res.end(typeof body === "string" ? body : JSON.stringify(body));
}

const payPage = (s: Obj) => `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Test payment</title></head>
<body style="font-family:sans-serif;max-width:28rem;margin:3rem auto"><h1>Test payment (local fake)</h1>
<p>Amount: <strong id="amount">${(Number(s.amount_total) / 100).toFixed(2)} ${String(s.currency).toUpperCase()}</strong></p>
<form method="post"><button type="submit" id="pay">Pay</button></form>
${s.cancel_url ? `<p><a href="${String(s.cancel_url)}">Cancel</a></p>` : ""}</body></html>`;

async function api(req: IncomingMessage, res: ServerResponse, path: string, params: Obj) {
  if (req.headers.authorization !== `Bearer ${config.STRIPE_SECRET_KEY}`) return send(res, 401, error("Invalid API key provided", "authentication_error"));
  const key = req.method === "POST" ? req.headers["idempotency-key"] : undefined;
  const cached = typeof key === "string" ? idempotent.get(key) : undefined;
  if (cached) return send(res, cached.status, cached.body);
  let answer: { status: number; body: Obj };
  let m: RegExpExecArray | null;
  if (req.method === "POST" && path === "/v1/checkout/sessions") answer = createSession(params);
  else if (req.method === "POST" && path === "/v1/refunds") answer = createRefund(params);
  else if (req.method === "GET" && (m = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(path))) answer = found(sessions.get(m[1]!));
  else if (req.method === "GET" && (m = /^\/v1\/payment_intents\/([\w-]+)$/.exec(path))) answer = found(intents.get(m[1]!));
  else answer = { status: 404, body: error(`Unrecognized request URL (${req.method}: ${path})`) };
  if (typeof key === "string") idempotent.set(key, answer);
  send(res, answer.status, answer.body);
}

const found = (o: Obj | undefined) => (o ? { status: 200, body: o } : { status: 404, body: error("No such object", "invalid_request_error") });

const server = createServer((req, res) => {
  void (async () => {
    const url = new URL(req.url ?? "/", `http://127.0.0.1:${port}`);
    const raw = req.method === "POST" ? await readBody(req) : "";
    const params = parseForm(raw || url.search.slice(1));
    let m: RegExpExecArray | null;
    if (url.pathname.startsWith("/v1/")) return api(req, res, url.pathname, params);
    if ((m = /^\/pay\/([\w-]+)$/.exec(url.pathname))) {
      const session = sessions.get(m[1]!);
      if (!session) return send(res, 404, "No such payment page", "text/plain");
      if (req.method === "GET") return send(res, 200, payPage(session), "text/html; charset=utf-8");
      await completeSession(m[1]!);
      res.writeHead(303, { location: String(session.success_url) });
      return res.end();
    }
    if (req.method === "POST" && (m = /^\/_test\/checkout\/sessions\/([\w-]+)\/complete$/.exec(url.pathname))) {
      const done = await completeSession(m[1]!);
      return done ? send(res, 200, done.delivery) : send(res, 404, error("No such checkout session"));
    }
    if (req.method === "POST" && (m = /^\/_test\/events\/([\w-]+)\/resend$/.exec(url.pathname))) {
      const event = events.get(m[1]!);
      if (!event) return send(res, 404, error("No such event"));
      return send(res, 200, await deliver(String(event.type), (event.data as Obj).object as Obj, m[1]!));
    }
    send(res, 404, error("Not found"));
  })().catch((err: Error) => send(res, 500, error(err.message, "api_error")));
});

server.listen(port, "127.0.0.1", () => console.log(`payments fake on 127.0.0.1:${port}, webhooks to ${webhookUrl}`));
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => server.close(() => process.exit(0)));
