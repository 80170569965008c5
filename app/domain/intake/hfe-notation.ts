// hFE as datasheets print it: "100-300", "≥ 100", ">= 100", "min 100", "≤ 300", "typ 200", or a plain number.

export type HfeRole = "hfeMin" | "hfeTyp" | "hfeMax";

/** What one hFE cell states: one or more of min, typ and max. */
export interface HfeValue {
  kind: "hfe";
  hfeMin: number | null;
  hfeTyp: number | null;
  hfeMax: number | null;
}

/** A failed reading says whether the cell looked like hFE notation at all (then its message is the one to show). */
export type HfeReading = { ok: true; value: HfeValue | number; reading: string } | { ok: false; message: string; recognised: boolean };

export const HFE_ROLES: readonly HfeRole[] = ["hfeMin", "hfeTyp", "hfeMax"];
export const HFE_ROLE_LABELS: Readonly<Record<HfeRole, string>> = { hfeMin: "hFE min", hfeTyp: "hFE typ", hfeMax: "hFE max" };

const NUMBER = String.raw`(\d+(?:[.,]\d+)?)`;
// A range: two numbers joined by a hyphen, dash, "to", "..." or "…" (ASCII hyphen and U+2010..U+2015, U+2212).
const RANGE = new RegExp(String.raw`^${NUMBER}\s*(?:[-\u2010-\u2015\u2212]|to|\.\.\.?|\u2026)\s*${NUMBER}$`, "i");
const QUALIFIED: ReadonlyArray<[RegExp, HfeRole]> = [
  [new RegExp(String.raw`^(?:\u2265|>=|=>|>|min\.?)\s*${NUMBER}$`, "i"), "hfeMin"],
  [new RegExp(String.raw`^(?:\u2264|<=|=<|<|max\.?)\s*${NUMBER}$`, "i"), "hfeMax"],
  [new RegExp(String.raw`^(?:typ(?:ical|\.)?|~|\u2248)\s*${NUMBER}$`, "i"), "hfeTyp"],
];
const PLAIN = new RegExp(String.raw`^${NUMBER}$`);

const toNumber = (text: string) => Number(text.replace(",", "."));

function value(parts: Partial<Record<HfeRole, number>>): HfeValue {
  return { kind: "hfe", hfeMin: parts.hfeMin ?? null, hfeTyp: parts.hfeTyp ?? null, hfeMax: parts.hfeMax ?? null };
}

/** Describes what a cell was read as, e.g. "hFE min 100, hFE max 300". */
export function describeHfe(hfe: HfeValue): string {
  return HFE_ROLES.filter((role) => hfe[role] !== null)
    .map((role) => `${HFE_ROLE_LABELS[role]} ${hfe[role]}`)
    .join(", ");
}

/**
 * Reads one hFE cell. `role` is the column's own (hfe_min, hfe_typ, hfe_max) or null for the `hfe` column, where
 * a plain number does not say what it is. A qualifier in the cell wins over the column.
 */
export function readHfe(text: string, role: HfeRole | null): HfeReading {
  const cell = text.trim();
  const range = RANGE.exec(cell);
  if (range) {
    const [low, high] = [toNumber(range[1]), toNumber(range[2])];
    if (low > high) return { ok: false, recognised: true, message: `the range "${cell}" runs from high to low; write the lower value first (${range[2]}-${range[1]})` };
    const hfe = value({ hfeMin: low, hfeMax: high });
    return { ok: true, value: hfe, reading: `read as ${describeHfe(hfe)}` };
  }
  for (const [pattern, stated] of QUALIFIED) {
    const match = pattern.exec(cell);
    if (!match) continue;
    const hfe = value({ [stated]: toNumber(match[1]) });
    return { ok: true, value: stated === role ? hfe[stated]! : hfe, reading: `read as ${describeHfe(hfe)}` };
  }
  if (PLAIN.test(cell) && role === null) {
    return { ok: false, recognised: true, message: `say which value "${cell}" is: write ≥ ${cell} for a minimum, typ ${cell}, ≤ ${cell} for a maximum, or a range such as 100-300` };
  }
  return { ok: false, recognised: false, message: `not an hFE value: "${cell}"; write a number, a range such as 100-300, ≥ 100, typ 200 or ≤ 300` };
}

/** An hFE cell's statement as min, typ and max, given the column it stands in. */
export function asHfeValue(cell: HfeValue | number, role: HfeRole): HfeValue {
  return typeof cell === "number" ? value({ [role]: cell }) : cell;
}
