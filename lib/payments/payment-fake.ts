// A local stand-in for the hosted payment service, for development and tests. It answers the SDK
// calls Kerfwise makes (Checkout Sessions create and retrieve, Refunds create), shows its own card
// page, and posts signed webhook events to the app. State lives in memory.
import { randomBytes } from 'node:crypto';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { decodeForm, field, type Nested } from './decode-form';
import { cardPageHtml } from './fake-card-page';
import { signWebhookPayload } from './sign-webhook';

export const TEST_CARDS = { approved: '4242424242424242', declined: '4000000000000002' } as const;

type Session = {
  id: string;
  object: 'checkout.session';
  amount_total: number;
  currency: string;
  mode: 'payment';
  status: 'open' | 'complete';
  payment_status: 'unpaid' | 'paid';
  payment_intent: string | null;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string;
  url: string;
  description: string;
  intentMetadata: Record<string, string>;
};

export type Deliver = (payload: string, signature: string) => Promise<void>;

export type PaymentFakeOptions = {
  port: number;
  host?: string;
  secretKey: string;
  webhookSecret: string;
  /** Where events go: a URL to POST to, or a function (tests call the route handler in-process). */
  webhook: string | Deliver;
};

const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
const strings = (node: Nested | string | undefined) =>
  Object.fromEntries(
    Object.entries(typeof node === 'object' ? node : {}).filter(([, v]) => typeof v === 'string'),
  ) as Record<string, string>;

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

function send(res: ServerResponse, status: number, body: unknown, type = 'application/json') {
  res.writeHead(status, { 'content-type': type });
  res.end(typeof body === 'string' ? body : JSON.stringify(body));
}

const apiError = (res: ServerResponse, status: number, message: string) =>
  send(res, status, { error: { type: 'invalid_request_error', message } });

export async function startPaymentFake(options: PaymentFakeOptions) {
  const sessions = new Map<string, Session>();
  const paidByIntent = new Map<string, { amount: number; refunded: number }>();
  let baseUrl = '';

  const deliver: Deliver =
    typeof options.webhook === 'function'
      ? options.webhook
      : async (payload, signature) => {
          await fetch(options.webhook as string, {
            method: 'POST',
            headers: { 'content-type': 'application/json', 'stripe-signature': signature },
            body: payload,
          });
        };

  async function emit(type: string, object: unknown) {
    const event = {
      id: newId('evt'),
      object: 'event',
      type,
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      api_version: null,
      data: { object },
    };
    const payload = JSON.stringify(event);
    await deliver(payload, signWebhookPayload(payload, options.webhookSecret));
  }

  function createSession(form: Nested): Session {
    const id = newId('cs_test');
    const amount = Number(field(form, 'line_items', '0', 'price_data', 'unit_amount'));
    const quantity = Number(field(form, 'line_items', '0', 'quantity') ?? '1');
    return {
      id,
      object: 'checkout.session',
      amount_total: amount * quantity,
      currency: field(form, 'line_items', '0', 'price_data', 'currency') ?? 'gbp',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      payment_intent: null,
      client_reference_id: field(form, 'client_reference_id') ?? null,
      metadata: strings(form.metadata),
      intentMetadata: strings(
        typeof form.payment_intent_data === 'object' ? form.payment_intent_data.metadata : undefined,
      ),
      success_url: field(form, 'success_url') ?? '',
      cancel_url: field(form, 'cancel_url') ?? '',
      url: `${baseUrl}/pay/${id}`,
      description: field(form, 'line_items', '0', 'price_data', 'product_data', 'name') ?? 'Payment',
    };
  }

  // The fake's own bookkeeping fields stay out of what the SDK sees.
  const publicSession = (session: Session) => {
    const copy: Partial<Session> = { ...session };
    delete copy.intentMetadata;
    delete copy.description;
    return copy;
  };

  async function api(req: IncomingMessage, res: ServerResponse, path: string) {
    if (req.headers.authorization !== `Bearer ${options.secretKey}`) {
      return send(res, 401, {
        error: { type: 'invalid_request_error', message: 'Invalid API key provided.' },
      });
    }
    const form = decodeForm(await readBody(req));
    if (req.method === 'POST' && path === '/v1/checkout/sessions') {
      const session = createSession(form);
      if (!Number.isInteger(session.amount_total) || session.amount_total < 30)
        return apiError(res, 400, 'The amount must be a whole number of pence, at least 30.');
      if (!session.success_url || !session.cancel_url)
        return apiError(res, 400, 'success_url and cancel_url are required.');
      sessions.set(session.id, session);
      return send(res, 200, publicSession(session));
    }
    const sessionMatch = /^\/v1\/checkout\/sessions\/([\w]+)$/.exec(path);
    if (req.method === 'GET' && sessionMatch) {
      const session = sessions.get(sessionMatch[1]);
      return session
        ? send(res, 200, publicSession(session))
        : apiError(res, 404, 'No such checkout session.');
    }
    if (req.method === 'POST' && path === '/v1/refunds') {
      const intent = field(form, 'payment_intent') ?? '';
      const paid = paidByIntent.get(intent);
      if (!paid) return apiError(res, 400, `No such payment_intent: '${intent}'`);
      const amount = Number(field(form, 'amount') ?? paid.amount - paid.refunded);
      if (!Number.isInteger(amount) || amount <= 0 || amount > paid.amount - paid.refunded)
        return apiError(res, 400, 'The refund is more than what is left of the payment.');
      paid.refunded += amount;
      const refund = {
        id: newId('re'),
        object: 'refund',
        amount,
        currency: 'gbp',
        payment_intent: intent,
        status: 'succeeded',
      };
      return send(res, 200, refund);
    }
    return apiError(res, 404, `Unrecognised request URL (${req.method}: ${path}).`);
  }

  async function cardPage(req: IncomingMessage, res: ServerResponse, sessionId: string) {
    const session = sessions.get(sessionId);
    if (!session) return send(res, 404, 'This payment page does not exist.', 'text/plain');
    const page = (error?: string) =>
      send(
        res,
        error ? 402 : 200,
        cardPageHtml({
          sessionId,
          description: session.description,
          amountPence: session.amount_total,
          cancelUrl: session.cancel_url,
          error,
        }),
        'text/html; charset=utf-8',
      );
    if (session.status === 'complete') return page('This payment is already complete.');
    if (req.method !== 'POST') return page();
    const card = (new URLSearchParams(await readBody(req)).get('card') ?? '').replace(/\D/g, '');
    const intentId = newId('pi');
    if (card === TEST_CARDS.approved) {
      Object.assign(session, { status: 'complete', payment_status: 'paid', payment_intent: intentId });
      paidByIntent.set(intentId, { amount: session.amount_total, refunded: 0 });
      await emit('checkout.session.completed', publicSession(session));
      res.writeHead(303, { location: session.success_url });
      return res.end();
    }
    const message =
      card === TEST_CARDS.declined ? 'Your card was declined.' : 'That is not a test card number.';
    await emit('payment_intent.payment_failed', {
      id: intentId,
      object: 'payment_intent',
      amount: session.amount_total,
      currency: session.currency,
      status: 'requires_payment_method',
      metadata: session.intentMetadata,
      last_payment_error: { code: 'card_declined', message },
    });
    return page(message);
  }

  const server = createServer((req, res) => {
    const path = new URL(req.url ?? '/', 'http://fake').pathname;
    const pay = /^\/pay\/([\w]+)$/.exec(path);
    const handle =
      path === '/health'
        ? Promise.resolve(send(res, 200, { ok: true }))
        : pay
          ? cardPage(req, res, pay[1])
          : api(req, res, path);
    handle.catch((error: Error) => send(res, 500, { error: { type: 'api_error', message: error.message } }));
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, options.host ?? '127.0.0.1', resolve);
  });
  const { port } = server.address() as AddressInfo;
  baseUrl = `http://${options.host ?? '127.0.0.1'}:${port}`;
  return {
    url: baseUrl,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
