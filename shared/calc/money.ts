/**
 * Money is an integer count of a currency's minor units (cents, pence, yen) with an ISO 4217 code.
 * How many decimals a currency has comes from the runtime's ISO 4217 data through Intl
 * (ECMA-402, NumberFormat's currency digits), so JPY shows none and EUR two.
 */

/** True for a three-letter code the runtime knows as an ISO 4217 currency. */
export function isKnownCurrency(code: string): boolean {
  if (!/^[A-Z]{3}$/.test(code)) return false;
  const supported = (Intl as { supportedValuesOf?: (k: string) => string[] }).supportedValuesOf;
  if (supported) return supported('currency').includes(code);
  try {
    new Intl.NumberFormat('en', { style: 'currency', currency: code });
    return true;
  } catch {
    return false;
  }
}

/** The number of decimals the currency is written with (ISO 4217 minor unit). */
export function currencyDecimals(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** "$25.00", "¥3,000", "€18.50": minor units shown with the currency's own decimals. */
export function formatMoney(minor: number, currency: string, locale = 'en'): string {
  const decimals = currencyDecimals(currency);
  return new Intl.NumberFormat(locale, { style: 'currency', currency, minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(minor / 10 ** decimals);
}

/** A typed amount ("25", "25.5", "3000") in minor units, or null when it has more decimals than the currency allows. */
export function parseMoney(text: string, currency: string): number | null {
  const decimals = currencyDecimals(currency);
  const m = /^\s*(\d{1,9})(?:[.,](\d*))?\s*$/.exec(text);
  if (!m) return null;
  const fraction = m[2] ?? '';
  if (fraction.length > decimals) return null;
  return Number(m[1]) * 10 ** decimals + Number(fraction.padEnd(decimals, '0') || '0');
}
