// Parses and validates an offers intake file into offer rows, with every problem found.
import { partKey } from "../part";
import { INTAKE_FORMATS } from "./columns";
import { OfferRowSchema, type OfferRow } from "./offer-schema";
import type { IntakeParseResult } from "./problems";
import { readTable } from "./read-table";
import { validateRows, type RawRow } from "./validate-rows";

export type OffersParseResult = IntakeParseResult<"offers", OfferRow>;

/** Reads an uploaded offers file into validated offer rows; part identity is checked by matchOffersToParts. */
export function parseOffersFile(bytes: Uint8Array): OffersParseResult {
  const format = INTAKE_FORMATS.offers;
  return validateRows<"offers", OfferRow>(readTable(bytes, format), format, {
    assemble: assembleOffer,
    schema: OfferRowSchema,
    identify: identifyOffer,
    duplicateColumn: "supplier",
    duplicateMessage: (firstRow) => `the same part and supplier as row ${firstRow}`,
  });
}

/** Identity of an offer: the part plus the supplier, trimmed and case-insensitive. */
export function offerKey(offer: { manufacturer: string; partNumber: string; supplier: string }): string {
  return `${partKey(offer.manufacturer, offer.partNumber)}\u0000${offer.supplier.trim().toLowerCase()}`;
}

function assembleOffer(raw: RawRow): unknown {
  const f = raw.fields;
  return {
    manufacturer: f.manufacturer ?? undefined,
    partNumber: f.partNumber ?? undefined,
    offer: {
      supplier: f.supplier ?? undefined,
      supplierSku: f.supplierSku ?? null,
      stock: f.stock ?? undefined,
      minimumOrder: f.minimumOrder ?? 1,
      orderMultiple: f.orderMultiple ?? 1,
      priceBreaks: raw.points.priceBreaks.map((p) => p.values),
      currency: f.currency ?? undefined,
      leadTimeDays: f.leadTimeDays ?? null,
      asOf: f.asOf ?? undefined,
    },
  };
}

function identifyOffer(raw: RawRow): string | null {
  const { manufacturer, partNumber, supplier } = raw.fields;
  if (typeof manufacturer !== "string" || typeof partNumber !== "string" || typeof supplier !== "string") return null;
  return offerKey({ manufacturer, partNumber, supplier });
}
