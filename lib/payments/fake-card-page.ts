// The local payment fake's own card page: plain HTML, no scripts.
import { formatPence } from '../format/money';

const escape = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function cardPageHtml({
  sessionId,
  description,
  amountPence,
  error,
  cancelUrl,
}: {
  sessionId: string;
  description: string;
  amountPence: number;
  error?: string;
  cancelUrl: string;
}) {
  const amount = formatPence(amountPence);
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>Pay ${amount} – local test payments</title>
<style>
body{font:16px/1.5 system-ui,sans-serif;background:#eef2f0;color:#1c2421;margin:0;padding:2rem 1rem}
main{max-width:26rem;margin:0 auto;background:#fff;border:1px solid #c9d3ce;border-radius:10px;padding:1.5rem}
h1{font-size:1.25rem;margin:0 0 .25rem}.amount{font-size:2rem;font-weight:700;margin:.5rem 0 1rem}
label{display:block;margin:.75rem 0 .25rem;font-weight:600}input{width:100%;box-sizing:border-box;padding:.6rem;border:1px solid #8a9a93;border-radius:6px;font:inherit}
.row{display:flex;gap:.75rem}.row>div{flex:1}button{margin-top:1.25rem;width:100%;padding:.75rem;border:0;border-radius:6px;background:#24614a;color:#fff;font:inherit;font-weight:700;cursor:pointer}
.error{background:#fbe9e7;border:1px solid #d9534f;color:#7a1f1a;padding:.6rem;border-radius:6px}
.note{font-size:.85rem;color:#4b5a54;margin-top:1rem}a{color:#24614a}
</style></head><body><main>
<p class="note">Local test payments — no real money moves.</p>
<h1>${escape(description)}</h1><p class="amount" data-testid="fake-amount">${amount}</p>
${error ? `<p class="error" role="alert" data-testid="fake-card-error">${escape(error)}</p>` : ''}
<form method="post" action="/pay/${escape(sessionId)}">
<label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="off" required>
<div class="row"><div><label for="expiry">Expiry (MM/YY)</label><input id="expiry" name="expiry" required></div>
<div><label for="cvc">Security code</label><input id="cvc" name="cvc" inputmode="numeric" required></div></div>
<button type="submit">Pay ${amount}</button></form>
<p class="note">Test cards: 4242 4242 4242 4242 is approved; 4000 0000 0000 0002 is declined.</p>
<p class="note"><a href="${escape(cancelUrl)}">Cancel and go back</a></p>
</main></body></html>`;
}
