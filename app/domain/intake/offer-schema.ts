// The rules an offer row must meet, as one zod schema.
import { z } from "zod";
import type { Offer, PriceBreak } from "../part";
import { INTAKE_FORMATS } from "./columns";
import { columnNamed, optionalNumber, optionalText, requiredNumber, requiredText } from "./schema-fields";

/** An offers-file row: which catalogue part, and the supplier's offer for it. */
export interface OfferRow {
  manufacturer: string;
  partNumber: string;
  offer: Offer;
}

const OFFERS = INTAKE_FORMATS.offers;
const offer = (name: string) => columnNamed(OFFERS, name);
const priceBreak = (name: string) => columnNamed(OFFERS, name, "break");

export const PriceBreakSchema: z.ZodType<PriceBreak> = z.object({
  quantity: requiredNumber(priceBreak("qty"), "quantity is required (the break has a price)"),
  unitPrice: requiredNumber(priceBreak("price"), "price is required (the break has a quantity)"),
});

export const OfferSchema: z.ZodType<Offer> = z.object({
  supplier: requiredText(offer("supplier")),
  supplierSku: optionalText(),
  stock: requiredNumber(offer("stock")),
  minimumOrder: requiredNumber(offer("minimum_order")),
  orderMultiple: requiredNumber(offer("order_multiple")),
  priceBreaks: z
    .array(PriceBreakSchema)
    .min(1, { error: "an offer needs at least one price break (break1_qty and break1_price)" })
    .superRefine((breaks, ctx) => {
      const firstByQuantity = new Map<number, number>();
      breaks.forEach((b, i) => {
        const first = firstByQuantity.get(b.quantity);
        if (first === undefined) firstByQuantity.set(b.quantity, i);
        else ctx.addIssue({ code: "custom", path: [i, "quantity"], message: `repeats the quantity ${b.quantity} of an earlier price break` });
      });
    }),
  currency: requiredText(offer("currency")),
  leadTimeDays: optionalNumber(offer("lead_time_days")),
  asOf: requiredText(offer("as_of")),
});

export const OfferRowSchema: z.ZodType<OfferRow> = z.object({
  manufacturer: requiredText(offer("manufacturer")),
  partNumber: requiredText(offer("part_number")),
  offer: OfferSchema,
});
