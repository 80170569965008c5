import { describe, expect, it } from "vitest";
import { splitCurrencySign } from "./money";

// The signs come from ICU's English currency names (Intl.NumberFormat, symbol and narrowSymbol displays).
describe("splitCurrencySign", () => {
  it("reads a sign or an ISO code before or after the amount", () => {
    expect(splitCurrencySign("€0,12")).toEqual({ sign: "€", amountText: "0,12", currencies: ["EUR"] });
    expect(splitCurrencySign("0.12 €")).toEqual({ sign: "€", amountText: "0.12", currencies: ["EUR"] });
    expect(splitCurrencySign("0.12 EUR")).toEqual({ sign: "EUR", amountText: "0.12", currencies: ["EUR"] });
    expect(splitCurrencySign("CHF 1.20")).toEqual({ sign: "CHF", amountText: "1.20", currencies: ["CHF"] });
  });

  it("says when a sign stands for several currencies, or for none it knows", () => {
    const dollar = splitCurrencySign("$0.10");
    expect(dollar).toMatchObject({ sign: "$", amountText: "0.10" });
    expect("currencies" in dollar && dollar.currencies).toEqual(expect.arrayContaining(["USD", "AUD", "CAD"]));
    expect(splitCurrencySign("0.10 pcs")).toEqual({ sign: "pcs", unknown: true });
    expect(splitCurrencySign("0.10")).toEqual({ sign: null });
  });
});
