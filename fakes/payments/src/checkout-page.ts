/**
 * The hosted test checkout page: plain server-rendered HTML in a design of our own, usable on a
 * phone, every field labelled, errors announced and tied to their fields. It says plainly that it
 * is a test page and which test cards do what.
 */
import { formatAmount } from './money';
import type { CheckoutSession, LineItem } from './store';

const ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (char) => ESCAPES[char]);
}

const STYLE = `
  :root { color-scheme: light; --ink: #1d2327; --muted: #4a555c; --line: #b8c2c8;
    --accent: #0b5d4b; --accent-ink: #ffffff; --error: #a4161a; --paper: #f4f6f5; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 1rem/1.5 system-ui, -apple-system, "Segoe UI", sans-serif;
    color: var(--ink); background: var(--paper); }
  main { max-width: 30rem; margin: 0 auto; padding: 1rem; }
  .notice { margin: 0 0 1rem; padding: 0.5rem 0.75rem; border-left: 4px solid var(--accent);
    background: #ffffff; font-size: 0.9375rem; }
  section { background: #ffffff; border: 1px solid var(--line); border-radius: 6px;
    padding: 1rem; margin-bottom: 1rem; }
  h1 { font-size: 1.375rem; margin: 0 0 0.75rem; }
  h2 { font-size: 1.0625rem; margin: 0 0 0.5rem; }
  ul.items { list-style: none; margin: 0; padding: 0; }
  ul.items li { display: flex; justify-content: space-between; gap: 1rem; padding: 0.25rem 0; }
  .total { display: flex; justify-content: space-between; gap: 1rem; font-weight: 700;
    border-top: 1px solid var(--line); margin-top: 0.5rem; padding-top: 0.5rem; }
  .field { margin-bottom: 1rem; }
  .row { display: flex; gap: 0.75rem; }
  .row .field { flex: 1 1 0; min-width: 0; }
  label { display: block; font-weight: 600; margin-bottom: 0.25rem; }
  .hint { display: block; color: var(--muted); font-size: 0.875rem; margin-bottom: 0.25rem; }
  input { width: 100%; min-height: 2.75rem; padding: 0.5rem 0.625rem; font: inherit;
    border: 1px solid #6b777e; border-radius: 4px; background: #ffffff; color: var(--ink); }
  input[aria-invalid="true"] { border: 2px solid var(--error); }
  input:focus-visible, button:focus-visible, a:focus-visible { outline: 3px solid #1a73a8;
    outline-offset: 2px; }
  .field-error { color: var(--error); font-size: 0.9375rem; margin: 0.25rem 0 0; }
  .summary { border: 2px solid var(--error); border-radius: 4px; padding: 0.5rem 0.75rem;
    margin-bottom: 1rem; color: var(--error); }
  .summary p { margin: 0; }
  button { width: 100%; min-height: 3rem; font: inherit; font-weight: 700; border: 0;
    border-radius: 4px; background: var(--accent); color: var(--accent-ink); cursor: pointer; }
  .cancel { display: inline-block; margin-top: 1rem; padding: 0.5rem 0; color: var(--accent); }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
<p class="notice">Test payment page of the local payments stand-in. No real card is charged.</p>
${body}
</main>
</body>
</html>
`;
}

export type CardField = 'number' | 'expiry' | 'cvc';

export interface PayPageInput {
  session: CheckoutSession;
  lineItems: LineItem[];
  values?: { number?: string; expiry?: string };
  fieldErrors?: Partial<Record<CardField, string>>;
  /** A refusal that is not about one field (a declined card). */
  formError?: string;
}

function field(
  name: CardField,
  label: string,
  hint: string,
  attributes: string,
  value: string,
  error: string | undefined,
): string {
  const id = `card-${name}`;
  const describedBy = [`${id}-hint`, error ? `${id}-error` : ''].filter(Boolean).join(' ');
  return `<div class="field">
<label for="${id}">${escapeHtml(label)}</label>
<span class="hint" id="${id}-hint">${escapeHtml(hint)}</span>
<input id="${id}" name="card_${name}" ${attributes} value="${escapeHtml(value)}" aria-describedby="${describedBy}"${error ? ' aria-invalid="true"' : ''} required>
${error ? `<p class="field-error" id="${id}-error">${escapeHtml(error)}</p>` : ''}
</div>`;
}

export function payPage(input: PayPageInput): string {
  const { session, lineItems, values = {}, fieldErrors = {}, formError } = input;
  const total = formatAmount(session.amount_total, session.currency);
  const items = lineItems
    .map(
      (item) =>
        `<li><span>${escapeHtml(item.description)}${item.quantity > 1 ? ` × ${item.quantity}` : ''}</span><span>${escapeHtml(formatAmount(item.amount_total, item.currency))}</span></li>`,
    )
    .join('\n');
  const messages = [formError, ...Object.values(fieldErrors)].filter((message): message is string =>
    Boolean(message),
  );
  const summary =
    messages.length > 0
      ? `<div class="summary" role="alert" id="payment-problem">${messages.map((m) => `<p>${escapeHtml(m)}</p>`).join('')}</div>`
      : '';
  const cancel = session.cancel_url
    ? `<a class="cancel" href="${escapeHtml(session.cancel_url)}">Cancel</a>`
    : '';
  return layout(
    `Pay ${total}`,
    `<section aria-labelledby="order-heading">
<h1 id="order-heading">Pay ${escapeHtml(total)}</h1>
<ul class="items">
${items}
</ul>
<p class="total"><span>Total</span><span>${escapeHtml(total)}</span></p>
</section>
<section aria-labelledby="card-heading">
<h2 id="card-heading">Card details</h2>
${summary}
<form method="post" action="/pay/${escapeHtml(session.id)}" novalidate>
${field(
  'number',
  'Card number',
  'Test cards: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined.',
  'type="text" inputmode="numeric" autocomplete="cc-number" maxlength="23"',
  values.number ?? '',
  fieldErrors.number,
)}
<div class="row">
${field(
  'expiry',
  'Expiry date',
  'MM/YY',
  'type="text" inputmode="numeric" autocomplete="cc-exp" maxlength="7"',
  values.expiry ?? '',
  fieldErrors.expiry,
)}
${field(
  'cvc',
  'Security code',
  '3 or 4 digits',
  'type="text" inputmode="numeric" autocomplete="cc-csc" maxlength="4"',
  '',
  fieldErrors.cvc,
)}
</div>
<button type="submit">Pay ${escapeHtml(total)}</button>
</form>
${cancel}
</section>`,
  );
}

/** A page that only says something: the session has expired, is paid already, or is unknown. */
export function messagePage(title: string, message: string, link?: { href: string; text: string }) {
  return layout(
    title,
    `<section>
<h1>${escapeHtml(title)}</h1>
<p>${escapeHtml(message)}</p>
${link ? `<a class="cancel" href="${escapeHtml(link.href)}">${escapeHtml(link.text)}</a>` : ''}
</section>`,
  );
}
