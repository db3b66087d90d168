// Stripe's documented test cards: 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is a
// generic decline [pub: Stripe docs, "Testing", test card numbers].
export const SUCCESS_CARD = '4242424242424242';
export const DECLINE_CARD = '4000000000000002';

export type CardFormField = 'email' | 'cardNumber' | 'expiry' | 'cvc' | 'name';
export type CardFormInput = Record<CardFormField, string>;
export type CardFormResult =
  | { ok: true; outcome: 'success' | 'declined'; email: string; name: string }
  | { ok: false; fieldErrors: Partial<Record<CardFormField, string>> };

const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Luhn (mod 10) check digit, as every payment card number carries [pub: ISO/IEC 7812-1]. */
export function passesLuhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return sum % 10 === 0;
}

function checkCardNumber(raw: string): string | undefined {
  const digits = raw.replace(/[\s-]/g, '');
  if (digits === '') return 'Enter the card number.';
  // Payment card numbers run 12 to 19 digits [pub: ISO/IEC 7812-1].
  if (!/^\d{12,19}$/.test(digits)) return 'Card number must be 12 to 19 digits.';
  if (!passesLuhn(digits)) return 'This card number is not valid (its check digit does not match).';
  if (digits !== SUCCESS_CARD && digits !== DECLINE_CARD) {
    return 'This local test page takes only the test cards 4242 4242 4242 4242 (succeeds) and 4000 0000 0000 0002 (declined).';
  }
  return undefined;
}

function checkExpiry(raw: string, now: Date): string | undefined {
  const match = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(raw);
  if (!match) return 'Enter the expiry as MM/YY.';
  const month = Number(match[1]);
  const yearText = match[2] ?? '';
  const year = yearText.length === 2 ? 2000 + Number(yearText) : Number(yearText);
  if (month < 1 || month > 12) return 'Expiry month must be 01 to 12.';
  // A card is valid through the last day of its expiry month.
  const endOfMonth = Date.UTC(year, month, 1);
  if (endOfMonth <= now.getTime()) return 'This card has expired.';
  return undefined;
}

/** Checks the test payment form field by field; only a fully valid form reaches the card outcome. */
export function checkCardForm(input: CardFormInput, now: Date): CardFormResult {
  const fieldErrors: Partial<Record<CardFormField, string>> = {};
  const email = input.email.trim();
  const name = input.name.trim();
  if (!EMAIL_PATTERN.test(email) || email.length > 254)
    fieldErrors.email = 'Enter an email address such as name@example.com.';
  const cardError = checkCardNumber(input.cardNumber);
  if (cardError) fieldErrors.cardNumber = cardError;
  const expiryError = checkExpiry(input.expiry, now);
  if (expiryError) fieldErrors.expiry = expiryError;
  if (!/^\d{3,4}$/.test(input.cvc.trim())) fieldErrors.cvc = 'CVC must be 3 or 4 digits.';
  if (name === '') fieldErrors.name = 'Enter the name on the card.';
  else if (name.length > 100) fieldErrors.name = 'Name on card must be at most 100 characters.';
  if (Object.keys(fieldErrors).length > 0) return { ok: false, fieldErrors };
  const digits = input.cardNumber.replace(/[\s-]/g, '');
  return { ok: true, outcome: digits === DECLINE_CARD ? 'declined' : 'success', email, name };
}
