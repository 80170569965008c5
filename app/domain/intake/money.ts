// Prices as offers are typed: "€0,12", "0.12 EUR", "US$ 0.12". The sign says which currencies the price may be in.

export interface MoneyValue {
  kind: "money";
  amount: number;
  /** The sign or code as typed, e.g. "€". */
  sign: string;
  /** ISO 4217 codes the sign stands for (one for "€", several for "$"). */
  currencies: string[];
}

const ISO_CURRENCIES = new Set(Intl.supportedValuesOf("currency"));
// A sign (or code) before or after the number, with or without a space.
const SIGNED_AMOUNT = /^([^\d\s.,+\-\u2212]*)\s*([+\-\u2212]?\d[\d.,]*)\s*([^\d\s.,]*)$/u;

let signs: Map<string, string[]> | undefined;

// Every sign ICU prints for a currency in English (symbol and narrow symbol): "€" is EUR only, "$" many dollars.
function currencySigns(): Map<string, string[]> {
  if (signs) return signs;
  signs = new Map();
  for (const code of ISO_CURRENCIES) {
    for (const currencyDisplay of ["symbol", "narrowSymbol"] as const) {
      const part = new Intl.NumberFormat("en", { style: "currency", currency: code, currencyDisplay }).formatToParts(1).find((p) => p.type === "currency");
      const sign = part?.value;
      if (!sign || sign === code) continue;
      const codes = signs.get(sign) ?? [];
      if (!codes.includes(code)) codes.push(code);
      signs.set(sign, codes);
    }
  }
  for (const codes of signs.values()) codes.sort();
  return signs;
}

export type MoneySplit = { sign: null } | { sign: string; amountText: string; currencies: string[] } | { sign: string; unknown: true };

/** Splits "€0,12" into the sign and the amount's text; `sign: null` when the cell has no currency sign or code. */
export function splitCurrencySign(text: string): MoneySplit {
  const match = SIGNED_AMOUNT.exec(text.trim());
  if (!match) return { sign: null };
  const [, before, amountText, after] = match;
  if (before !== "" && after !== "") return { sign: `${before} ${after}`, unknown: true };
  const sign = before || after;
  if (sign === "") return { sign: null };
  const code = sign.toUpperCase();
  if (/^[A-Z]{3}$/.test(code) && ISO_CURRENCIES.has(code)) return { sign, amountText, currencies: [code] };
  const currencies = currencySigns().get(sign);
  return currencies ? { sign, amountText, currencies } : { sign, unknown: true };
}
