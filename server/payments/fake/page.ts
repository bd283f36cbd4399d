import type { FakeSession } from './store';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** An amount in minor units, with the currency's own number of decimals (ISO 4217, as Intl knows them). */
export function formatMinor(amountMinor: number, currency: string): string {
  const format = new Intl.NumberFormat('en', { style: 'currency', currency: currency.toUpperCase() });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(amountMinor / 10 ** digits);
}

const frame = (title: string, body: string) => `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(title)}</title>
<style>
body{margin:0;background:#f4efe4;color:#1b1b1b;font:16px/1.5 system-ui,sans-serif}
main{max-width:28rem;margin:2rem auto;padding:1.5rem;box-sizing:border-box;width:calc(100% - 2rem);border:2px solid #1b1b1b;background:#fff}
h1{font-size:1.1rem;letter-spacing:.15em;text-transform:uppercase;margin:0 0 1rem}
.amount{font-size:2rem;font-weight:700;margin:.25rem 0 1rem}
.note{border-left:4px solid #b7791f;padding:.5rem .75rem;background:#fbf6ea;font-size:.9rem}
form{display:inline}
button{min-height:44px;padding:0 1.25rem;border:2px solid #1b1b1b;font:inherit;font-weight:700;text-transform:uppercase;cursor:pointer}
.pay{background:#1b1b1b;color:#fff}.cancel{background:#fff;color:#1b1b1b}
.actions{display:flex;gap:.75rem;flex-wrap:wrap;margin-top:1.25rem}
</style></head><body><main>${body}</main></body></html>`;

/** The checkout page: what is paid for, how much, and two buttons. No card is asked for. */
export function checkoutPage(session: FakeSession): string {
  const amount = formatMinor(session.amount_total, session.currency);
  if (session.status !== 'open') {
    const said = session.status === 'complete' ? 'This payment is done.' : 'This payment page has expired. Go back and start the payment again.';
    return frame('Payment', `<h1>Test payment</h1><p>${esc(said)}</p>`);
  }
  return frame(
    `Pay ${amount}`,
    `<h1>Test payment</h1>
<p>${esc(session.description)}</p>
<p class="amount">${esc(amount)}</p>
<p class="note">Placard's local stand-in for the payment service: no card is asked for and no money moves.</p>
<div class="actions">
<form method="post" action="/pay/${esc(session.id)}/pay"><button class="pay" type="submit">Pay ${esc(amount)}</button></form>
<form method="post" action="/pay/${esc(session.id)}/cancel"><button class="cancel" type="submit">Cancel</button></form>
</div>`,
  );
}

export const notFoundPage = () => frame('Not found', '<h1>Test payment</h1><p>No such payment page.</p>');
