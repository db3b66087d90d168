import type { CardFormField, CardFormInput } from '../card-form';
import { escapeHtml, formatMoney, pageShell } from './page-shell';

export type CheckoutLine = { label: string; quantity: number; amountMinor: number; intervalLabel: string };

export type CheckoutPageModel = {
  sessionId: string;
  currency: string;
  totalMinor: number;
  intervalLabel: string;
  lines: CheckoutLine[];
  values: Partial<CardFormInput>;
  /** Set when the customer's email is fixed by the session. */
  emailLocked: boolean;
  fieldErrors: Partial<Record<CardFormField, string>>;
  formError: string | null;
  cancelUrl: string | null;
};

const FIELDS: { key: CardFormField; label: string; autocomplete: string; type: string; extra: string }[] = [
  { key: 'email', label: 'Email', autocomplete: 'email', type: 'email', extra: '' },
  {
    key: 'cardNumber',
    label: 'Card number',
    autocomplete: 'cc-number',
    type: 'text',
    extra: 'inputmode="numeric" placeholder="4242 4242 4242 4242"',
  },
  {
    key: 'expiry',
    label: 'Expiry (MM/YY)',
    autocomplete: 'cc-exp',
    type: 'text',
    extra: 'inputmode="numeric" placeholder="MM/YY"',
  },
  { key: 'cvc', label: 'CVC', autocomplete: 'cc-csc', type: 'text', extra: 'inputmode="numeric" placeholder="123"' },
  { key: 'name', label: 'Name on card', autocomplete: 'cc-name', type: 'text', extra: '' },
];

function field(model: CheckoutPageModel, key: CardFormField): string {
  const spec = FIELDS.find((f) => f.key === key);
  if (!spec) return '';
  const error = model.fieldErrors[key];
  const id = `field-${key}`;
  const value = model.values[key] ?? '';
  const locked = key === 'email' && model.emailLocked ? 'readonly' : '';
  return `<div><label for="${id}">${spec.label}</label>
<input id="${id}" name="${key}" type="${spec.type}" autocomplete="${spec.autocomplete}" ${spec.extra} ${locked}
 value="${escapeHtml(value)}" aria-invalid="${error ? 'true' : 'false'}"${error ? ` aria-describedby="${id}-error"` : ''}>
${error ? `<div class="field-error" id="${id}-error">${escapeHtml(error)}</div>` : ''}</div>`;
}

/** The fake's own hosted checkout: order summary, test-card hint and the card form. */
export function renderCheckoutPage(model: CheckoutPageModel): string {
  const total = formatMoney(model.totalMinor, model.currency);
  const rows = model.lines
    .map(
      (line) =>
        `<tr><td>${escapeHtml(line.label)}${line.quantity > 1 ? ` × ${line.quantity}` : ''}</td><td class="num">${formatMoney(line.amountMinor, model.currency)} ${escapeHtml(line.intervalLabel)}</td></tr>`,
    )
    .join('');
  const alert = model.formError ? `<div class="alert" role="alert">${escapeHtml(model.formError)}</div>` : '';
  const cancel = model.cancelUrl ? `<a href="${escapeHtml(model.cancelUrl)}">Back without paying</a>` : '';
  const body = `
<section class="panel">
  <h1>Subscribe to Dutywise</h1>
  <p class="muted">Checkout reference ${escapeHtml(model.sessionId.slice(0, 20))}…</p>
  <table><tbody>${rows}</tbody><tfoot><tr><th>Total</th><th class="num">${total} ${escapeHtml(model.intervalLabel)}</th></tr></tfoot></table>
</section>
<section class="panel">
  <h2>Card details</h2>
  <p class="hint">Test cards only: <strong>4242 4242 4242 4242</strong> succeeds, <strong>4000 0000 0000 0002</strong> is declined. Any future expiry and any 3-digit CVC.</p>
  ${alert}
  <form method="post" action="/pay/${escapeHtml(model.sessionId)}" novalidate>
    ${field(model, 'email')}
    ${field(model, 'cardNumber')}
    <div class="row">${field(model, 'expiry')}${field(model, 'cvc')}</div>
    ${field(model, 'name')}
    <div class="actions"><button type="submit">Pay ${total} and subscribe</button>${cancel}</div>
  </form>
</section>`;
  return pageShell('Subscribe to Dutywise', body);
}
