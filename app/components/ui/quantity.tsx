// A value with its unit: the number in tabular figures, a thin gap, the unit a shade lighter.
import { formatQuantity, type Dimension } from "#app/domain/quantity.ts";

export function Qty({ value, dimension, digits }: { value: number | null | undefined; dimension: Dimension; digits?: number }) {
  if (value === null || value === undefined || !Number.isFinite(value)) return <span className="text-ink/50">—</span>;
  const text = formatQuantity(value, dimension, digits === undefined ? undefined : { digits });
  const split = text.lastIndexOf(" ");
  const number = split === -1 ? text : text.slice(0, split);
  const unit = split === -1 ? "" : text.slice(split + 1);
  return (
    <span className="whitespace-nowrap tabular-nums">
      {number}
      {unit ? <span className="ml-[0.2em] text-ink/60">{unit}</span> : null}
    </span>
  );
}
