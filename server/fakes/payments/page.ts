/** The fake's hosted payment page: one field, `card`, posting back to the same address. */
const esc = (s: string) =>
  s.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!,
  );

export function paymentPage(opts: {
  action: string;
  amount: number;
  currency: string;
  description: string;
  cancelUrl: string | null;
  message?: { kind: 'error' | 'info'; text: string };
}) {
  const money = new Intl.NumberFormat('en-US', {
    style: 'currency',
    currency: opts.currency.toUpperCase(),
  }).format(opts.amount / 100);
  const note = opts.message
    ? `<p role="${opts.message.kind === 'error' ? 'alert' : 'status'}" class="${opts.message.kind}">${esc(opts.message.text)}</p>`
    : '';
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Pay ${esc(money)} — test payment page</title>
<style>
body{font-family:system-ui,sans-serif;background:#eef1f4;margin:0;padding:24px;color:#1f2328}
main{max-width:420px;margin:0 auto;background:#fff;border-radius:10px;padding:24px;box-shadow:0 1px 3px #0002}
h1{font-size:1.1rem;margin:0 0 4px} .amount{font-size:2rem;font-weight:700;margin:8px 0 16px}
label{display:block;font-weight:600;margin-bottom:6px} input{width:100%;box-sizing:border-box;font-size:1.1rem;padding:12px;border:1px solid #9aa4ae;border-radius:6px}
button{margin-top:16px;width:100%;padding:14px;font-size:1rem;font-weight:600;color:#fff;background:#2f5d50;border:0;border-radius:6px}
.error{background:#fdecec;color:#8a1c1c;padding:10px;border-radius:6px} .info{background:#eef5ff;padding:10px;border-radius:6px}
.test{font-size:.8rem;color:#5b6470} a{color:#1d5f8c}
</style></head>
<body><main>
<p class="test">Local test payment page — no real card is charged.</p>
<h1>${esc(opts.description)}</h1>
<div class="amount">${esc(money)}</div>
${note}
<form method="post" action="${esc(opts.action)}">
<label for="card">Card number</label>
<input id="card" name="card" inputmode="numeric" autocomplete="off" placeholder="4242 4242 4242 4242" required>
<button type="submit">Pay ${esc(money)}</button>
</form>
<p class="test">Test cards: 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined.</p>
${opts.cancelUrl ? `<p><a href="${esc(opts.cancelUrl)}">Cancel and go back</a></p>` : ''}
</main></body></html>`;
}
