// The two intake file formats as data: the one source for the parser, the templates and the docs page.
import Papa from "papaparse";
import { CONFIGURATIONS, LIFECYCLES, PTOT_REFERENCES } from "../part";
import { formatQuantity, unitSymbol, type Dimension } from "../quantity";
import type { HfeRole } from "./hfe-notation";
import type { IntakeKind } from "./problems";

/** Uploads above this size are refused before parsing (HTTP 413). */
export const MAX_INTAKE_BYTES = 20 * 1024 * 1024;

/** Longest cell accepted; datasheet values are short, a longer cell is a pasting accident. */
export const MAX_CELL_LENGTH = 500;

export type CellType =
  /** `clean`: names compared by identity (manufacturer, part number, supplier) or resolved to a package outline. */
  | { kind: "text"; clean?: "name" | "package" }
  | { kind: "choice"; choices: readonly string[]; aliases?: Readonly<Record<string, string>> }
  | { kind: "quantity"; dimension: Dimension }
  /** `fromOn`: a price-break quantity, where "100+" (from 100 on) is how suppliers write it. */
  | { kind: "count"; fromOn?: boolean }
  /** hFE: a number, or the datasheet's notation ("100-300", "≥ 100", "typ 200"); `role` is null for the `hfe` column. */
  | { kind: "hfe"; role: HfeRole | null }
  | { kind: "amount" }
  | { kind: "currency" }
  | { kind: "url" }
  | { kind: "date" };

/** Plausible values in SI base units; `min` is excluded when `minExclusive` (ratings must be above zero). */
export interface PlausibleRange {
  min: number;
  minExclusive: boolean;
  max: number;
}

export interface ColumnSpec {
  /** Column name in the file; for a numbered group, the part after `gainN_`. */
  name: string;
  /** Trade name used in messages (VCEO, IC max, hFE min). */
  label: string;
  /** Field of the domain object the column fills. */
  field: string;
  type: CellType;
  required: boolean;
  description: string;
  example: string;
  range?: PlausibleRange;
  /**
   * A number typed without a unit outside [min, max] (SI) is refused as a probable missing unit, suggesting `unit`:
   * fT "300" reads as 300 Hz, which no transistor has.
   */
  bareHint?: BareNumberHint;
  /** Another way to write other columns (the `hfe` column); left out of templates and exports. */
  alternative?: boolean;
}

export interface BareNumberHint {
  unit: string;
  min?: number;
  max?: number;
}

export interface ColumnGroupSpec {
  /** Column names are `${prefix}${N}_${column.name}`, N = 1, 2, 3, ... */
  prefix: "gain" | "sat" | "break";
  /** Used in messages: "gain point 2". */
  label: string;
  /** Field of the domain object holding the list of points. */
  field: string;
  /** At least one point per row. */
  required: boolean;
  description: string;
  columns: ColumnSpec[];
}

export interface IntakeFormat {
  kind: IntakeKind;
  description: string;
  columns: ColumnSpec[];
  groups: ColumnGroupSpec[];
}

// Plausibility limits for small-signal to power bipolar transistors (common practice, not a standard).
const above = (max: number): PlausibleRange => ({ min: 0, minExclusive: true, max });
const between = (min: number, max: number): PlausibleRange => ({ min, minExclusive: false, max });

const text = { kind: "text" } as const;
const name = { kind: "text", clean: "name" } as const;
const quantity = (dimension: Dimension) => ({ kind: "quantity", dimension }) as const;
const count = { kind: "count" } as const;
const hfe = (role: HfeRole | null) => ({ kind: "hfe", role }) as const;

function column(
  name: string,
  label: string,
  field: string,
  type: CellType,
  required: boolean,
  description: string,
  example: string,
  range?: PlausibleRange,
  bareHint?: BareNumberHint,
): ColumnSpec {
  return { name, label, field, type, required, description, example, range, ...(bareHint ? { bareHint } : {}) };
}

// Words for the lifecycle states as datasheets and distributors print them. "EOL" (end of life) is read as obsolete,
// the state an engineer must not design in; the preview shows that reading.
const LIFECYCLE_ALIASES = {
  "not recommended for new designs": "nrnd",
  "last time buy": "last-time-buy",
  ltb: "last-time-buy",
  eol: "obsolete",
  "end of life": "obsolete",
  "end-of-life": "obsolete",
  discontinued: "obsolete",
};

const POLARITY_ALIASES = { n: "npn", p: "pnp" };

// Bare numbers beyond these are taken for a missing prefix (common practice: discrete BJTs have fT from about 1 MHz
// up and Cob in picofarads; a bare base-emitter or saturation voltage above its plausible range was meant in mV).
const FT_HINT: BareNumberHint = { unit: "MHz", min: 1e5 };
const COB_HINT: BareNumberHint = { unit: "pF", max: 1e-6 };
const millivolts = (maxVolts: number): BareNumberHint => ({ unit: "mV", max: maxVolts });

const PARTS_FORMAT: IntakeFormat = {
  kind: "parts",
  description: "Datasheet values, one row per part. A part is identified by manufacturer and part number.",
  columns: [
    column("manufacturer", "manufacturer", "manufacturer", name, true, "Manufacturer's name as printed on the datasheet.", "Tarnwell Microsystems"),
    column("part_number", "part number", "partNumber", name, true, "Orderable part number; with the manufacturer it identifies the part (any case, spacing and look-alike characters).", "TW-G3152"),
    column("polarity", "polarity", "polarity", { kind: "choice", choices: ["NPN", "PNP"], aliases: POLARITY_ALIASES }, true, "NPN or PNP (N or P), any case.", "NPN"),
    column("package", "package", "packageName", { kind: "text", clean: "package" }, true, "Package outline, e.g. TO-92, SOT-23, TO-220; TO92 and to 92 read as TO-92.", "TO-126"),
    column("configuration", "configuration", "configuration", { kind: "choice", choices: CONFIGURATIONS }, false, "single, darlington (Darlington pair in one package) or dual; single when empty.", "single"),
    column("vceo", "VCEO", "vceoVolts", quantity("voltage"), true, "Collector-emitter voltage rating, base open.", "55 V", above(3000)),
    column("vcbo", "VCBO", "vcboVolts", quantity("voltage"), false, "Collector-base voltage rating, emitter open.", "70 V", above(3000)),
    column("vebo", "VEBO", "veboVolts", quantity("voltage"), false, "Emitter-base voltage rating, collector open.", "5 V", above(100)),
    column("ic_max", "IC max", "icMaxAmps", quantity("current"), true, "Continuous collector current rating.", "1.8 A", above(1000)),
    column("ptot", "Ptot", "ptotWatts", quantity("power"), false, "Total power dissipation at 25 °C (give ptot_ref).", "14 W", above(2000)),
    column("ptot_ref", "Ptot reference", "ptotReference", { kind: "choice", choices: PTOT_REFERENCES }, false, "Whether Ptot holds the ambient or the case at 25 °C; required when ptot is given.", "case"),
    column("tj_max", "Tj max", "tjMaxC", quantity("temperature"), false, "Maximum junction temperature.", "150 °C", between(0, 300)),
    column("rth_ja", "Rth(j-a)", "rthJaCPerW", quantity("thermal-resistance"), false, "Thermal resistance junction to ambient; K/W is the same unit.", "95 °C/W", above(2000)),
    column("rth_jc", "Rth(j-c)", "rthJcCPerW", quantity("thermal-resistance"), false, "Thermal resistance junction to case.", "8.93 °C/W", above(500)),
    column("vbe_on", "VBE(on)", "vbeOnVolts", quantity("voltage"), false, "Base-emitter voltage in the active region.", "900 mV", above(5), millivolts(5)),
    column("ft", "fT", "ftHz", quantity("frequency"), false, "Transition frequency; a bare number below 100 kHz is refused as a missing unit.", "62 MHz", above(100e9), FT_HINT),
    column("cob", "Cob", "cobFarads", quantity("capacitance"), false, "Output capacitance, common base.", "9.4 pF", above(100e-9), COB_HINT),
    column("early_voltage", "Early voltage", "earlyVolts", quantity("voltage"), false, "Early voltage VA, when the datasheet or a model gives it.", "170 V", above(10_000)),
    column("lifecycle", "lifecycle", "lifecycle", { kind: "choice", choices: LIFECYCLES, aliases: LIFECYCLE_ALIASES }, false, "active, nrnd, last-time-buy or obsolete (LTB, EOL and discontinued are read as such); active when empty.", "active"),
    column("datasheet_url", "datasheet URL", "datasheetUrl", { kind: "url" }, false, "Link to the datasheet (http or https).", "https://datasheets.example.com/tarnwell-microsystems/tw-g3152.pdf"),
    column("datasheet_date", "datasheet date", "datasheetRevisionDate", { kind: "date" }, false, "Revision date of the datasheet, YYYY-MM-DD.", "2022-03-14"),
  ],
  groups: [
    {
      prefix: "gain",
      label: "gain point",
      field: "gainPoints",
      required: true,
      description: "hFE as the datasheet quotes it at one collector current; repeat as gain2_*, gain3_* for more currents.",
      columns: [
        column("ic", "IC", "icAmps", quantity("current"), true, "Collector current of the gain point.", "200 mA", above(1000)),
        column("vce", "VCE", "vceVolts", quantity("voltage"), false, "Collector-emitter voltage of the gain point.", "2 V", above(3000)),
        { ...column("hfe", "hFE", "hfe", hfe(null), false, "hFE as the datasheet prints it: a range 100-300, ≥ 100, typ 200 or ≤ 300 (instead of, or with, the three columns below).", "108-205"), alternative: true },
        column("hfe_min", "hFE min", "hfeMin", hfe("hfeMin"), false, "Minimum hFE (give at least one of min, typ, max); a range 100-300 fills min and max.", "108", above(100_000)),
        column("hfe_typ", "hFE typ", "hfeTyp", hfe("hfeTyp"), false, "Typical hFE.", "150", above(100_000)),
        column("hfe_max", "hFE max", "hfeMax", hfe("hfeMax"), false, "Maximum hFE.", "205", above(100_000)),
        column("temp", "temperature", "tempC", quantity("temperature"), false, "Temperature of the gain point.", "25 °C", between(-100, 300)),
      ],
    },
    {
      prefix: "sat",
      label: "saturation point",
      field: "saturationPoints",
      required: false,
      description: "VCE(sat) quoted at one collector current and base current; repeat as sat2_*, ...",
      columns: [
        column("ic", "IC", "icAmps", quantity("current"), true, "Collector current of the saturation point.", "800 mA", above(1000)),
        column("ib", "IB", "ibAmps", quantity("current"), false, "Base current that forces saturation.", "80 mA", above(1000)),
        column("vce_max", "VCE(sat) max", "vceSatMaxVolts", quantity("voltage"), false, "Maximum collector-emitter saturation voltage.", "670 mV", above(50), millivolts(50)),
        column("vce_typ", "VCE(sat) typ", "vceSatTypVolts", quantity("voltage"), false, "Typical collector-emitter saturation voltage.", "330 mV", above(50), millivolts(50)),
        column("vbe", "VBE(sat)", "vbeSatVolts", quantity("voltage"), false, "Base-emitter saturation voltage.", "1.13 V", above(10), millivolts(10)),
      ],
    },
  ],
};

const OFFERS_FORMAT: IntakeFormat = {
  kind: "offers",
  description: "Stock and prices, one row per part and supplier. The part must already be in the catalogue.",
  columns: [
    column("manufacturer", "manufacturer", "manufacturer", name, true, "Manufacturer of a catalogue part (any case and spacing).", "Tarnwell Microsystems"),
    column("part_number", "part number", "partNumber", name, true, "Part number of a catalogue part (any case and spacing).", "TW-G3152"),
    column("supplier", "supplier", "supplier", name, true, "Supplier's name; one offer per part and supplier.", "Larkspur Component Supply"),
    column("supplier_sku", "supplier SKU", "supplierSku", text, false, "Supplier's own order code.", "LCS-TW-G3152"),
    column("stock", "stock", "stock", count, true, "Units in stock, a whole number; digit grouping (12.000 or 12,000) is read.", "6900", between(0, 1e9)),
    column("minimum_order", "minimum order", "minimumOrder", count, false, "Smallest order quantity; 1 when empty.", "1", between(1, 1e9)),
    column("order_multiple", "order multiple", "orderMultiple", count, false, "Orders must be a multiple of this; 1 when empty.", "1", between(1, 1e9)),
    column("currency", "currency", "currency", { kind: "currency" }, true, "ISO 4217 code of the prices.", "EUR"),
    column("lead_time_days", "lead time", "leadTimeDays", count, false, "Lead time in days when out of stock.", "3", between(0, 3650)),
    column("as_of", "as-of date", "asOf", { kind: "date" }, true, "Date the stock and prices were read, YYYY-MM-DD.", "2026-11-28"),
  ],
  groups: [
    {
      prefix: "break",
      label: "price break",
      field: "priceBreaks",
      required: true,
      description: "Unit price from a quantity on; repeat as break2_*, break3_* for more quantities.",
      columns: [
        column("qty", "quantity", "quantity", { kind: "count", fromOn: true }, true, "Quantity from which the price applies; 10+ is read as 10.", "1", between(1, 1e9)),
        column("price", "price", "unitPrice", { kind: "amount" }, true, "Unit price in the row's currency; a sign or code (€0,12, 0.12 USD) must agree with the currency column, or fills it when empty.", "0.27", between(0, 1e6)),
      ],
    },
  ],
};

export const INTAKE_FORMATS: Readonly<Record<IntakeKind, IntakeFormat>> = { parts: PARTS_FORMAT, offers: OFFERS_FORMAT };

/** Name of a numbered group column, e.g. `gain2_hfe_min`. */
export function groupColumnName(group: ColumnGroupSpec, pointNumber: number, column: ColumnSpec): string {
  return `${group.prefix}${pointNumber}_${column.name}`;
}

/** One line of the documentation page. */
export interface ColumnDoc {
  name: string;
  label: string;
  type: string;
  unit: string;
  required: string;
  description: string;
  example: string;
  plausible: string;
}

/** Every column of a format, numbered groups shown as `gainN_ic`, for the documentation page. */
export function listColumnDocs(kind: IntakeKind): ColumnDoc[] {
  const format = INTAKE_FORMATS[kind];
  const docs = format.columns.map((c) => describeColumn(c, c.name, c.required ? "yes" : "no"));
  for (const group of format.groups) {
    for (const c of group.columns) {
      const required = c.required ? `when the ${group.label} is given${group.required ? "; at least one point per row" : ""}` : "no";
      docs.push(describeColumn(c, `${group.prefix}N_${c.name}`, required));
    }
  }
  return docs;
}

function describeColumn(spec: ColumnSpec, name: string, required: string): ColumnDoc {
  return {
    name,
    label: spec.label,
    type: describeType(spec.type),
    unit: spec.type.kind === "quantity" ? unitSymbol(spec.type.dimension) : "",
    required,
    description: spec.description,
    example: spec.example,
    plausible: spec.range ? describeRange(spec) : "",
  };
}

function describeType(type: CellType): string {
  switch (type.kind) {
    case "text":
      return "text";
    case "choice":
      return `one of ${type.choices.join(", ")}`;
    case "quantity":
      return type.dimension === "ratio" ? "number" : type.dimension.replace("-", " ");
    case "count":
      return type.fromOn ? "whole number (10+ allowed)" : "whole number";
    case "hfe":
      return type.role === null ? "range 100-300, ≥ 100, typ 200 or ≤ 300" : "number, or a range 100-300";
    case "amount":
      return "decimal number";
    case "currency":
      return "ISO 4217 currency code";
    case "url":
      return "http(s) address";
    case "date":
      return "date YYYY-MM-DD";
  }
}

/** The plausible range in words, as messages and the docs page show it. */
export function describeRange(spec: ColumnSpec): string {
  const range = spec.range;
  if (!range) return "";
  const show = (value: number) => showValue(spec, value);
  return range.minExclusive ? `above ${show(range.min)} up to ${show(range.max)}` : `${show(range.min)} to ${show(range.max)}`;
}

/** A value of the column printed with its unit (engineering notation for quantities). */
export function showValue(spec: ColumnSpec, value: number): string {
  return spec.type.kind === "quantity" ? formatQuantity(value, spec.type.dimension, { digits: 6 }) : String(value);
}

/** A template for a format: the header (one point of each group) and one example row. */
export function templateCsv(kind: IntakeKind): string {
  const format = INTAKE_FORMATS[kind];
  const fields = format.columns.map((c) => c.name);
  const example = format.columns.map((c) => c.example);
  for (const group of format.groups) {
    for (const c of group.columns.filter((column) => !column.alternative)) {
      fields.push(groupColumnName(group, 1, c));
      example.push(c.example);
    }
  }
  return `${Papa.unparse({ fields, data: [example] })}\r\n`;
}
