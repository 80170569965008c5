// The catalogue list's query (sort, filters, paging, columns) as it travels in the URL, for the page and the API.
import { z } from "zod";
import { CONFIGURATIONS, LIFECYCLES, POLARITIES } from "#app/domain/part.ts";
import { formatQuantity, parseQuantity, type Dimension } from "#app/domain/quantity.ts";
import type { FieldErrors } from "./forms.ts";

export const PART_SORTS = ["manufacturer", "partNumber", "polarity", "package", "vceo", "icMax", "ptot", "ft", "hfe", "lifecycle", "price"] as const;
export type PartSort = (typeof PART_SORTS)[number];

export interface PartColumn {
  id: string;
  label: string;
  /** Dimension of the value for engineering notation; null for text and counts. */
  dimension: Dimension | null;
  /** The `sort` value that orders by this column, or null when it cannot be sorted. */
  sort: PartSort | null;
  defaultVisible: boolean;
}

/** Every column the catalogue list can show, in display order. */
export const PART_COLUMNS: readonly PartColumn[] = [
  { id: "manufacturer", label: "Manufacturer", dimension: null, sort: "manufacturer", defaultVisible: true },
  { id: "partNumber", label: "Part number", dimension: null, sort: "partNumber", defaultVisible: true },
  { id: "polarity", label: "Polarity", dimension: null, sort: "polarity", defaultVisible: true },
  { id: "package", label: "Package", dimension: null, sort: "package", defaultVisible: true },
  { id: "configuration", label: "Configuration", dimension: null, sort: null, defaultVisible: false },
  { id: "vceo", label: "VCEO", dimension: "voltage", sort: "vceo", defaultVisible: true },
  { id: "icMax", label: "IC max", dimension: "current", sort: "icMax", defaultVisible: true },
  { id: "ptot", label: "Ptot", dimension: "power", sort: "ptot", defaultVisible: true },
  { id: "ft", label: "fT", dimension: "frequency", sort: "ft", defaultVisible: false },
  { id: "hfe", label: "hFE", dimension: "ratio", sort: "hfe", defaultVisible: true },
  { id: "lifecycle", label: "Lifecycle", dimension: null, sort: "lifecycle", defaultVisible: true },
  { id: "offers", label: "Offers", dimension: null, sort: null, defaultVisible: false },
  { id: "price", label: "Best unit price", dimension: null, sort: "price", defaultVisible: true },
  { id: "stock", label: "Stock", dimension: null, sort: null, defaultVisible: false },
  { id: "flags", label: "Data quality", dimension: null, sort: null, defaultVisible: false },
];

export const PART_COLUMN_IDS = PART_COLUMNS.map((c) => c.id);
export const DEFAULT_PAGE_SIZE = 50;
export const MIN_PAGE_SIZE = 10;
export const MAX_PAGE_SIZE = 200;

const many = <T extends z.ZodType>(item: T) =>
  z.preprocess((value) => (value === undefined ? [] : Array.isArray(value) ? value.filter((v) => v !== "") : value === "" ? [] : [value]), z.array(item));

const blankToUndefined = (value: unknown) => (value === "" ? undefined : value);

/** A quantity typed with or without a unit (`100mA`, `0.1`, `45 V`), read by the engine's own parser. */
function quantityParam(dimension: Dimension, label: string) {
  return z.preprocess(
    blankToUndefined,
    z
      .string()
      .transform((text, ctx) => {
        const parsed = parseQuantity(text, dimension);
        if (!parsed.ok) {
          ctx.addIssue({ code: "custom", message: `${label}: ${parsed.reason}` });
          return z.NEVER;
        }
        return parsed.value;
      })
      .optional(),
  );
}

function numberParam(label: string) {
  return z.preprocess(
    blankToUndefined,
    z.coerce.number({ error: `${label} must be a number` }).refine(Number.isFinite, { error: `${label} must be a number` }).optional(),
  );
}

function wholeParam(label: string, min: number, max: number, fallback: number) {
  return z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: `${label} must be a whole number` })
      .int({ error: `${label} must be a whole number` })
      .min(min, { error: `${label} must be at least ${min}` })
      .max(max, { error: `${label} must be at most ${max}` })
      .default(fallback),
  );
}

const choice = <const T extends readonly [string, ...string[]]>(values: T, label: string) =>
  z.enum(values, { error: `${label} must be one of ${values.join(", ")}` });

export const PartListQuerySchema = z
  .object({
    sort: z.preprocess(blankToUndefined, choice(PART_SORTS, "sort").default("manufacturer")),
    dir: z.preprocess(blankToUndefined, choice(["asc", "desc"], "dir").default("asc")),
    page: wholeParam("page", 1, 1_000_000, 1),
    size: wholeParam("size", MIN_PAGE_SIZE, MAX_PAGE_SIZE, DEFAULT_PAGE_SIZE),
    q: z.preprocess(blankToUndefined, z.string().trim().max(200, { error: "q must be at most 200 characters" }).optional()),
    polarity: z.preprocess(blankToUndefined, choice(POLARITIES, "polarity").optional()),
    package: many(z.string().trim().min(1).max(100, { error: "package must be at most 100 characters" })),
    configuration: z.preprocess(blankToUndefined, choice(CONFIGURATIONS, "configuration").optional()),
    vceoMin: quantityParam("voltage", "vceoMin"),
    vceoMax: quantityParam("voltage", "vceoMax"),
    icMaxMin: quantityParam("current", "icMaxMin"),
    icMaxMax: quantityParam("current", "icMaxMax"),
    hfeAt: quantityParam("current", "hfeAt"),
    hfeMin: numberParam("hfeMin"),
    hfeMax: numberParam("hfeMax"),
    lifecycle: many(choice(LIFECYCLES, "lifecycle")),
    hasOffers: z.preprocess(blankToUndefined, choice(["yes", "no"], "hasOffers").optional()),
    // Prices sort and show in this currency; other currencies follow, each apart (amounts are never converted).
    currency: z.preprocess(
      blankToUndefined,
      z
        .string()
        .trim()
        .regex(/^[A-Za-z]{3}$/, { error: "currency must be a three-letter ISO 4217 code such as EUR" })
        .transform((code) => code.toUpperCase())
        .optional(),
    ),
    cols: many(z.enum(PART_COLUMN_IDS as [string, ...string[]], { error: `cols must be among ${PART_COLUMN_IDS.join(", ")}` })),
  })
  .superRefine((query, ctx) => {
    const ranges: Array<[keyof typeof query, keyof typeof query]> = [
      ["vceoMin", "vceoMax"],
      ["icMaxMin", "icMaxMax"],
      ["hfeMin", "hfeMax"],
    ];
    for (const [low, high] of ranges) {
      const a = query[low];
      const b = query[high];
      if (typeof a === "number" && typeof b === "number" && a > b) {
        ctx.addIssue({ code: "custom", path: [high], message: `${high} must not be below ${low}` });
      }
    }
    if ((query.hfeMin !== undefined || query.hfeMax !== undefined) && query.hfeAt === undefined) {
      ctx.addIssue({ code: "custom", path: ["hfeAt"], message: "hfeAt: give the collector current at which to compare hFE, e.g. 100mA" });
    }
    if (query.hfeAt !== undefined && !(query.hfeAt > 0)) {
      ctx.addIssue({ code: "custom", path: ["hfeAt"], message: "hfeAt must be a collector current above zero" });
    }
  });

export type PartListQuery = z.infer<typeof PartListQuerySchema>;

const REPEATABLE = new Set(["package", "lifecycle", "cols"]);

/** Reads the list query from a URL's search params; unknown params are ignored. */
export function parsePartListQuery(searchParams: URLSearchParams): { ok: true; query: PartListQuery } | { ok: false; fieldErrors: FieldErrors } {
  const input: Record<string, string | string[]> = {};
  for (const key of new Set(searchParams.keys())) {
    const all = searchParams.getAll(key);
    input[key] = REPEATABLE.has(key) ? all : (all.at(-1) ?? "");
  }
  const result = PartListQuerySchema.safeParse(input);
  if (result.success) return { ok: true, query: result.data };
  const fieldErrors: FieldErrors = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join(".") || "form";
    fieldErrors[String(issue.path[0] ?? key)] ??= issue.message;
  }
  return { ok: false, fieldErrors };
}

/** The default query: first page, sorted by manufacturer, no filters. */
export function defaultPartListQuery(): PartListQuery {
  return PartListQuerySchema.parse({});
}

// Typed values go back in engineering notation without a space (`100mA`), which reads back to the same number.
function quantityText(value: number, dimension: Dimension): string {
  return formatQuantity(value, dimension, { ascii: true, digits: 15 }).replace(" ", "");
}

/** The query as search params, leaving out defaults, so a view can be shared as a URL (round trip with parsePartListQuery). */
export function toSearchParams(query: Partial<PartListQuery>): URLSearchParams {
  const params = new URLSearchParams();
  const defaults = defaultPartListQuery();
  if (query.sort && query.sort !== defaults.sort) params.set("sort", query.sort);
  if (query.dir && query.dir !== defaults.dir) params.set("dir", query.dir);
  if (query.page && query.page !== defaults.page) params.set("page", String(query.page));
  if (query.size && query.size !== defaults.size) params.set("size", String(query.size));
  if (query.q) params.set("q", query.q);
  if (query.polarity) params.set("polarity", query.polarity);
  for (const p of query.package ?? []) params.append("package", p);
  if (query.configuration) params.set("configuration", query.configuration);
  const quantities: Array<[keyof PartListQuery, Dimension]> = [
    ["vceoMin", "voltage"],
    ["vceoMax", "voltage"],
    ["icMaxMin", "current"],
    ["icMaxMax", "current"],
    ["hfeAt", "current"],
  ];
  for (const [key, dimension] of quantities) {
    const value = query[key];
    if (typeof value === "number") params.set(key, quantityText(value, dimension));
  }
  if (query.hfeMin !== undefined) params.set("hfeMin", String(query.hfeMin));
  if (query.hfeMax !== undefined) params.set("hfeMax", String(query.hfeMax));
  for (const l of query.lifecycle ?? []) params.append("lifecycle", l);
  if (query.hasOffers) params.set("hasOffers", query.hasOffers);
  if (query.currency) params.set("currency", query.currency);
  for (const c of query.cols ?? []) params.append("cols", c);
  return params;
}

/** The columns to show: those named in `cols`, else the default set. */
export function visibleColumns(query: Pick<PartListQuery, "cols">): PartColumn[] {
  if (query.cols.length === 0) return PART_COLUMNS.filter((c) => c.defaultVisible);
  return PART_COLUMNS.filter((c) => query.cols.includes(c.id));
}
