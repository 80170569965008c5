// Parses and validates an offers intake file into offer rows, with every problem found.
import { partKey } from "../part";
import type { CellValue } from "./cells";
import { groupColumnName, INTAKE_FORMATS } from "./columns";
import { identityKey } from "./identity";
import type { MoneyValue } from "./money";
import { OfferRowSchema, type OfferRow } from "./offer-schema";
import type { ParseOptions } from "./parse-parts";
import { warnAboutOffer } from "./plausibility";
import type { IntakeParseResult } from "./problems";
import { readTable } from "./read-table";
import { validateRows, type RawRow, type RowReport } from "./validate-rows";

export type OffersParseResult = IntakeParseResult<"offers", OfferRow>;

const BREAK = INTAKE_FORMATS.offers.groups.find((g) => g.prefix === "break")!;
const PRICE = BREAK.columns.find((c) => c.field === "unitPrice")!;
const CURRENCIES_SHOWN = 5;

/** Reads an uploaded offers file into validated offer rows; part identity is checked by matchOffersToParts. */
export function parseOffersFile(bytes: Uint8Array, options: ParseOptions = {}): OffersParseResult {
  const format = INTAKE_FORMATS.offers;
  return validateRows<"offers", OfferRow>(readTable(bytes, format), format, {
    assemble: assembleOffer,
    schema: OfferRowSchema,
    identify: identifyOffer,
    duplicateColumn: "supplier",
    duplicateMessage: (firstRow) => `the same part and supplier as row ${firstRow}`,
    warn: (row, columnOf) => warnAboutOffer(row, columnOf, options.todayIso),
  });
}

/** Identity of an offer: the part plus the supplier, compared as look-alike names. */
export function offerKey(offer: { manufacturer: string; partNumber: string; supplier: string }): string {
  return `${partKey(offer.manufacturer, offer.partNumber)}\u0000${identityKey(offer.supplier)}`;
}

function assembleOffer(raw: RawRow, report: RowReport): unknown {
  const f = raw.fields;
  const currency = resolveCurrency(raw, report);
  return {
    manufacturer: f.manufacturer ?? undefined,
    partNumber: f.partNumber ?? undefined,
    offer: {
      supplier: f.supplier ?? undefined,
      supplierSku: f.supplierSku ?? null,
      stock: f.stock ?? undefined,
      minimumOrder: f.minimumOrder ?? 1,
      orderMultiple: f.orderMultiple ?? 1,
      priceBreaks: raw.points.priceBreaks.map((p) => ({ ...p.values, unitPrice: isMoney(p.values.unitPrice) ? p.values.unitPrice.amount : p.values.unitPrice })),
      currency: currency ?? undefined,
      leadTimeDays: f.leadTimeDays ?? null,
      asOf: f.asOf ?? undefined,
    },
  };
}

const isMoney = (value: CellValue | undefined): value is MoneyValue => value !== null && typeof value === "object" && value.kind === "money";

// A price typed with its sign ("€0,12") must agree with the currency column, and fills it when that cell is empty.
function resolveCurrency(raw: RawRow, report: RowReport): string | null {
  const given = typeof raw.fields.currency === "string" ? raw.fields.currency : null;
  const signed = raw.points.priceBreaks.flatMap((p) => (isMoney(p.values.unitPrice) ? [{ money: p.values.unitPrice, column: groupColumnName(BREAK, p.pointNumber, PRICE) }] : []));
  if (signed.length === 0) return given;
  let candidates = given === null ? null : [given];
  for (const { money, column } of signed) {
    if (given !== null && !money.currencies.includes(given)) {
      report.problem(column, `the price is in ${money.sign} (${listCodes(money.currencies)}) but the row's currency is ${given}`);
      continue;
    }
    candidates = candidates === null ? [...money.currencies] : candidates.filter((c) => money.currencies.includes(c));
  }
  if (given === null) {
    if (candidates === null || candidates.length !== 1) {
      const signs = [...new Set(signed.map((s) => s.money.sign))].join(", ");
      report.problem("currency", `currency is required: ${signs} stands for several currencies (${listCodes(candidates ?? [])}); write the ISO code in the currency column`);
      return null;
    }
    report.reading("currency", `read as ${candidates[0]}, from the ${signed[0]!.money.sign} in the prices`);
  }
  const currency = candidates?.[0] ?? given;
  for (const { money, column } of signed) if (currency && money.currencies.includes(currency)) report.reading(column, `read as ${money.amount} ${currency}`);
  return currency;
}

function listCodes(codes: readonly string[]): string {
  return codes.length > CURRENCIES_SHOWN ? `${codes.slice(0, CURRENCIES_SHOWN).join(", ")}, …` : codes.join(", ");
}

function identifyOffer(raw: RawRow): string | null {
  const { manufacturer, partNumber, supplier } = raw.fields;
  if (typeof manufacturer !== "string" || typeof supplier !== "string" || typeof partNumber !== "string") return null;
  return offerKey({ manufacturer, partNumber, supplier });
}
