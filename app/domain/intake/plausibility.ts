// Warnings across fields of an accepted row: values each fine alone that together look like a slip.
// They do not reject the row; the preview lists them and the librarian commits with them or fixes the file.
import type { PartSpec } from "../part";
import { formatQuantity } from "../quantity";
import type { OfferRow } from "./offer-schema";
import { findPackageOutline } from "./package-outlines";
import type { ColumnLocator } from "./validate-rows";

export interface RowWarning {
  column: string;
  message: string;
}

/** A saturated transistor still drops about this much at its rated current (common practice: 0.1 V is very low). */
export const LOWEST_DROP_VOLTS = 0.1;

const amps = (value: number) => formatQuantity(value, "current", { digits: 6 });
const watts = (value: number) => formatQuantity(value, "power", { digits: 6 });

/** Warnings for a parts row: IC max beyond the outline or Ptot, gain quoted above IC max, a datasheet from the future. */
export function warnAboutPart(spec: PartSpec, columnOf: ColumnLocator, todayIso?: string): RowWarning[] {
  const warnings: RowWarning[] = [];
  const outline = findPackageOutline(spec.packageName);
  if (outline && spec.icMaxAmps > outline.maxIcAmps) {
    warnings.push({
      column: columnOf("icMaxAmps"),
      message: `IC max ${amps(spec.icMaxAmps)} is far above what a ${outline.name} package carries (parts in it are rated up to about ${amps(outline.maxIcAmps)}); check the unit`,
    });
  }
  // Relative margin so that 3 A × 0.1 V against 0.3 W (0.30000000000000004 in binary) is not a warning.
  if (spec.ptotWatts !== null && spec.icMaxAmps * LOWEST_DROP_VOLTS > spec.ptotWatts * (1 + 1e-9)) {
    warnings.push({
      column: columnOf("icMaxAmps"),
      message: `IC max ${amps(spec.icMaxAmps)} is far above what Ptot ${watts(spec.ptotWatts)} can carry: even a ${LOWEST_DROP_VOLTS} V drop at that current dissipates ${watts(spec.icMaxAmps * LOWEST_DROP_VOLTS)}; check the unit`,
    });
  }
  spec.gainPoints.forEach((point, index) => {
    if (point.icAmps > spec.icMaxAmps) {
      warnings.push({
        column: columnOf("icAmps", { field: "gainPoints", index }),
        message: `gain point ${index + 1} is quoted at IC ${amps(point.icAmps)}, above IC max ${amps(spec.icMaxAmps)}; check the unit`,
      });
    }
  });
  if (todayIso && spec.datasheetRevisionDate !== null && spec.datasheetRevisionDate > todayIso) {
    warnings.push({ column: columnOf("datasheetRevisionDate"), message: `datasheet date ${spec.datasheetRevisionDate} is in the future` });
  }
  return warnings;
}

/** Warnings for an offers row: a zero price, prices rising with quantity, breaks below the minimum order, a future as-of date. */
export function warnAboutOffer(row: OfferRow, columnOf: ColumnLocator, todayIso?: string): RowWarning[] {
  const { offer } = row;
  const warnings: RowWarning[] = [];
  const at = (field: string, index: number) => columnOf(field, { field: "priceBreaks", index });
  offer.priceBreaks.forEach((b, index) => {
    if (b.unitPrice === 0) warnings.push({ column: at("unitPrice", index), message: `price break ${index + 1}: the price is zero` });
    if (b.quantity < offer.minimumOrder) {
      warnings.push({
        column: at("quantity", index),
        message: `price break ${index + 1}: quantity ${b.quantity} is below the minimum order of ${offer.minimumOrder}, so this price cannot be ordered`,
      });
    }
  });
  const byQuantity = offer.priceBreaks.map((b, index) => ({ ...b, index })).sort((a, b) => a.quantity - b.quantity);
  for (let i = 1; i < byQuantity.length; i += 1) {
    const [lower, higher] = [byQuantity[i - 1]!, byQuantity[i]!];
    if (higher.unitPrice > lower.unitPrice) {
      warnings.push({
        column: at("unitPrice", higher.index),
        message: `price break ${higher.index + 1}: the price rises with quantity (${lower.unitPrice} from ${lower.quantity}, ${higher.unitPrice} from ${higher.quantity})`,
      });
    }
  }
  if (todayIso && offer.asOf > todayIso) {
    warnings.push({ column: columnOf("asOf"), message: `as-of date ${offer.asOf} is in the future` });
  }
  return warnings;
}
