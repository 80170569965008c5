// Catalogue reads (list with filters, one part with offers and history) and the librarian's correction of one part.
import { QueryTypes } from "sequelize";
import { assessDataQuality, DEFAULT_STALE_AFTER_YEARS, type DataQualityFlag } from "#app/domain/data-quality.ts";
import { worstCaseGain } from "#app/domain/gain-curve.ts";
import { listPartChanges } from "#app/domain/intake/compare.ts";
import { identityKey } from "#app/domain/intake/identity.ts";
import { packageKey } from "#app/domain/intake/package-outlines.ts";
import { LIFECYCLES, type CataloguePart, type GainPoint, type Offer, type PartSpec } from "#app/domain/part.ts";
import { formatQuantity } from "#app/domain/quantity.ts";
import type { PartListQuery } from "#app/lib/catalogue-query.ts";
import { db } from "#app/lib/db.server.ts";
import {
  bumpCatalogueVersion,
  insertPartRevisions,
  lockCatalogue,
  normaliseSpec,
  OFFER_SELECT,
  PART_SELECT,
  readCatalogueVersion,
  rowToOffer,
  rowToPart,
  specOf,
  updateParts,
  type OfferRowSql,
  type PartRow,
} from "./catalogue-store.server.ts";

export interface Money {
  amount: number;
  currency: string;
}

export interface PartListRow {
  id: string;
  manufacturer: string;
  partNumber: string;
  polarity: CataloguePart["polarity"];
  packageName: string;
  configuration: CataloguePart["configuration"];
  vceoVolts: number;
  icMaxAmps: number;
  ptotWatts: number | null;
  ftHz: number | null;
  lifecycle: CataloguePart["lifecycle"];
  /** Worst-case hFE at the query's hfeAt (engine gain curve); null without hfeAt or without quoted gain. */
  hfeAtChosen: number | null;
  /** The datasheet's headline gain, e.g. "100–300 @ 2 mA". */
  hfeSummary: string;
  offerCount: number;
  /**
   * Lowest first-break unit price in the list's currency (`priceCurrency`) when the part has an offer in it, else in
   * the part's most offered currency. Amounts are never converted.
   */
  bestUnitPrice: Money | null;
  stockTotal: number;
  flags: string[];
}

export interface PartList {
  rows: PartListRow[];
  total: number;
  page: number;
  pageSize: number;
  /** Every package name in the catalogue, for the filter UI. */
  packages: string[];
  /** The currency prices are sorted in: the query's, else the one most offers are in. Parts without it sort after. */
  priceCurrency: string | null;
}

export interface PartRevisionView {
  id: string;
  createdAt: string;
  /** intake: written by an intake's commit; rollback: restored when that intake was rolled back; edit: a librarian's correction. */
  action: "intake" | "rollback" | "edit";
  source: { kind: "intake"; intakeId: string; fileName: string } | { kind: "edit"; editorName: string };
  changes: Array<{ field: string; before: unknown; after: unknown }>;
}

export interface PartDetail {
  part: CataloguePart;
  offers: Array<Offer & { id: string }>;
  revisions: PartRevisionView[];
  dataQuality: { flags: string[]; notes: string[] };
  catalogueVersion: number;
}

interface CachedPart {
  part: CataloguePart;
  manufacturerLower: string;
  partNumberLower: string;
  packageLower: string;
  headlineHfe: number | null;
  hfeSummary: string;
  offerCount: number;
  bestUnitPrice: Money | null;
  /** Lowest first-break unit price per currency. */
  pricesByCurrency: Map<string, number>;
  stockTotal: number;
  flags: DataQualityFlag[];
}

interface CatalogueCache {
  version: number;
  day: string;
  parts: CachedPart[];
  packages: string[];
  /** The currency most offers are in. */
  mainCurrency: string | null;
}

// The list reads a per-process copy of the catalogue keyed on catalogue_version (design section 10):
// every commit, rollback and edit bumps the version, so every app instance reloads on its next request.
let cache: CatalogueCache | undefined;
let loading: { version: number; promise: Promise<CatalogueCache> } | undefined;

function today(): string {
  return new Date().toISOString().slice(0, 10);
}

async function loadCatalogue(version: number): Promise<CatalogueCache> {
  const sequelize = db().sequelize;
  const [partRows, offerRows] = await Promise.all([
    sequelize.query<PartRow>(`SELECT ${PART_SELECT} FROM parts p`, { type: QueryTypes.SELECT }),
    sequelize.query<OfferRowSql>(`SELECT ${OFFER_SELECT} FROM offers o`, { type: QueryTypes.SELECT }),
  ]);
  const offersByPart = new Map<string, Offer[]>();
  for (const row of offerRows) {
    const list = offersByPart.get(row.part_id) ?? [];
    list.push(rowToOffer(row));
    offersByPart.set(row.part_id, list);
  }
  const day = today();
  const packages = new Set<string>();
  const currencyCounts = new Map<string, number>();
  for (const row of offerRows) currencyCounts.set(row.currency, (currencyCounts.get(row.currency) ?? 0) + 1);
  const mainCurrency = [...currencyCounts.entries()].sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))[0]?.[0] ?? null;
  const parts = partRows.map((row): CachedPart => {
    const part = rowToPart(row);
    packages.add(part.packageName);
    const offers = offersByPart.get(part.id) ?? [];
    const headline = headlineGain(part.gainPoints);
    return {
      part,
      manufacturerLower: identityKey(part.manufacturer),
      partNumberLower: identityKey(part.partNumber),
      packageLower: packageKey(part.packageName),
      headlineHfe: headline.value,
      hfeSummary: headline.summary,
      offerCount: offers.length,
      bestUnitPrice: bestPrice(offers),
      pricesByCurrency: pricesByCurrency(offers),
      stockTotal: offers.reduce((sum, o) => sum + o.stock, 0),
      flags: assessDataQuality(part, { todayIso: day }).flags,
    };
  });
  return { version, day, parts, packages: [...packages].sort((a, b) => a.localeCompare(b)), mainCurrency };
}

async function catalogue(): Promise<CatalogueCache> {
  const version = await readCatalogueVersion();
  if (cache && cache.version === version && cache.day === today()) return cache;
  if (loading?.version !== version) {
    const promise = loadCatalogue(version).then(
      (loaded) => {
        if (!cache || loaded.version >= cache.version) cache = loaded;
        return loaded;
      },
      (error: unknown) => {
        loading = undefined;
        throw error;
      },
    );
    loading = { version, promise };
  }
  return loading.promise;
}

/** The datasheet's headline gain point: the one with the highest worst-case hFE (hFE min, else typ × 0.5). */
function headlineGain(points: readonly GainPoint[]): { value: number | null; summary: string } {
  let best: { point: GainPoint; value: number } | null = null;
  for (const point of points) {
    const value = point.hfeMin ?? (point.hfeTyp !== null ? point.hfeTyp * 0.5 : point.hfeMax !== null ? point.hfeMax * 0.25 : null);
    if (value !== null && (!best || value > best.value)) best = { point, value };
  }
  if (!best) return { value: null, summary: "no gain quoted" };
  const { point } = best;
  const at = ` @ ${formatQuantity(point.icAmps, "current")}`;
  const range =
    point.hfeMin !== null && point.hfeMax !== null
      ? `${point.hfeMin}–${point.hfeMax}`
      : point.hfeMin !== null
        ? `≥ ${point.hfeMin}`
        : point.hfeTyp !== null
          ? `typ ${point.hfeTyp}`
          : `≤ ${point.hfeMax}`;
  return { value: best.value, summary: `${range}${at}` };
}

function bestPrice(offers: readonly Offer[]): Money | null {
  const byCurrency = new Map<string, number[]>();
  for (const offer of offers) {
    const first = [...offer.priceBreaks].sort((a, b) => a.quantity - b.quantity)[0];
    if (!first) continue;
    byCurrency.set(offer.currency, [...(byCurrency.get(offer.currency) ?? []), first.unitPrice]);
  }
  const currencies = [...byCurrency.entries()].sort((a, b) => b[1].length - a[1].length || a[0].localeCompare(b[0]));
  const top = currencies[0];
  return top ? { amount: Math.min(...top[1]), currency: top[0] } : null;
}

function pricesByCurrency(offers: readonly Offer[]): Map<string, number> {
  const prices = new Map<string, number>();
  for (const offer of offers) {
    const first = [...offer.priceBreaks].sort((a, b) => a.quantity - b.quantity)[0];
    if (!first) continue;
    const known = prices.get(offer.currency);
    if (known === undefined || first.unitPrice < known) prices.set(offer.currency, first.unitPrice);
  }
  return prices;
}

/** The part's price to show and sort by: in the list's currency when it has one, else its most offered currency. */
function priceIn(entry: CachedPart, currency: string | null): Money | null {
  const amount = currency === null ? undefined : entry.pricesByCurrency.get(currency);
  return amount === undefined ? entry.bestUnitPrice : { amount, currency: currency! };
}

function gainAt(part: CataloguePart, icAmps: number): number | null {
  const estimate = worstCaseGain(part.gainPoints, icAmps);
  return estimate.source === "none" ? null : estimate.hfe;
}

const within = (value: number | null, min: number | undefined, max: number | undefined) =>
  (min === undefined || (value !== null && value >= min)) && (max === undefined || (value !== null && value <= max));

type Key = string | number | ReadonlyArray<string | number>;
type SortKey = (entry: CachedPart, hfe: number | null, currency: string | null) => Key | null;

const LIFECYCLE_ORDER = new Map<string, number>(LIFECYCLES.map((l, i) => [l, i]));

const SORT_KEYS: Record<PartListQuery["sort"], SortKey> = {
  manufacturer: (e) => e.manufacturerLower,
  partNumber: (e) => e.partNumberLower,
  polarity: (e) => e.part.polarity,
  package: (e) => e.packageLower,
  vceo: (e) => e.part.vceoVolts,
  icMax: (e) => e.part.icMaxAmps,
  ptot: (e) => e.part.ptotWatts,
  ft: (e) => e.part.ftHz,
  hfe: (e, hfe) => hfe ?? e.headlineHfe,
  lifecycle: (e) => LIFECYCLE_ORDER.get(e.part.lifecycle) ?? 99,
  // Amounts in different currencies are never compared: the list's currency first, then each other currency apart.
  price: (e, _hfe, currency) => {
    const price = priceIn(e, currency);
    if (!price) return null;
    return price.currency === currency ? [0, "", price.amount] : [1, price.currency, price.amount];
  },
};

// Plain code-unit order on identity keys: fast enough to sort a large catalogue on every uncached query.
// A tuple key groups first (its leading parts, always ascending) and orders by its last part in the asked direction.
function compareKeys(a: Key, b: Key, direction = 1): number {
  if (Array.isArray(a) && Array.isArray(b)) {
    for (let i = 0; i < a.length; i += 1) {
      const order = compareKeys(a[i] as string | number, b[i] as string | number) * (i === a.length - 1 ? direction : 1);
      if (order !== 0) return order;
    }
    return 0;
  }
  const order = typeof a === "number" && typeof b === "number" ? a - b : String(a) < String(b) ? -1 : String(a) > String(b) ? 1 : 0;
  return order * direction;
}

interface Match {
  entry: CachedPart;
  hfe: number | null;
}

// Sorted matches per query, for the current catalogue version only: paging and repeated views cost a slice.
const RESULT_CACHE_SIZE = 200;
const results = new Map<string, Match[]>();
let resultsVersion = -1;

function resultKey(query: PartListQuery): string {
  const { page: _page, size: _size, cols: _cols, ...filters } = query;
  return JSON.stringify(filters);
}

function findMatches(parts: readonly CachedPart[], query: PartListQuery, currency: string | null): Match[] {
  const q = query.q === undefined ? undefined : identityKey(query.q);
  const wantedPackages = new Set(query.package.map((p) => packageKey(p)));
  const wantedLifecycles = new Set<string>(query.lifecycle);
  const hfeAt = query.hfeAt;
  const matches: Match[] = [];
  for (const entry of parts) {
    const { part } = entry;
    if (q && !entry.manufacturerLower.includes(q) && !entry.partNumberLower.includes(q)) continue;
    if (query.polarity && part.polarity !== query.polarity) continue;
    if (wantedPackages.size > 0 && !wantedPackages.has(entry.packageLower)) continue;
    if (query.configuration && part.configuration !== query.configuration) continue;
    if (!within(part.vceoVolts, query.vceoMin, query.vceoMax)) continue;
    if (!within(part.icMaxAmps, query.icMaxMin, query.icMaxMax)) continue;
    if (wantedLifecycles.size > 0 && !wantedLifecycles.has(part.lifecycle)) continue;
    if (query.hasOffers === "yes" && entry.offerCount === 0) continue;
    if (query.hasOffers === "no" && entry.offerCount > 0) continue;
    const hfe = hfeAt === undefined ? null : gainAt(part, hfeAt);
    if (hfeAt !== undefined && !within(hfe, query.hfeMin, query.hfeMax)) continue;
    matches.push({ entry, hfe });
  }
  const key = SORT_KEYS[query.sort];
  const direction = query.dir === "desc" ? -1 : 1;
  const keyed = matches.map((match) => ({ match, key: key(match.entry, match.hfe, currency) }));
  keyed.sort((a, b) => {
    if (a.key === null || b.key === null) {
      if (a.key !== b.key) return a.key === null ? 1 : -1;
    } else {
      const order = compareKeys(a.key, b.key, direction);
      if (order !== 0) return order;
    }
    return (
      compareKeys(a.match.entry.manufacturerLower, b.match.entry.manufacturerLower) ||
      compareKeys(a.match.entry.partNumberLower, b.match.entry.partNumberLower)
    );
  });
  return keyed.map((k) => k.match);
}

/** One page of the catalogue with the query's filters and sort; missing values sort last either way. */
export async function listParts(query: PartListQuery): Promise<PartList> {
  const current = await catalogue();
  if (resultsVersion !== current.version) {
    results.clear();
    resultsVersion = current.version;
  }
  const currency = query.currency ?? current.mainCurrency;
  const key = resultKey(query);
  let matches = results.get(key);
  if (matches) {
    results.delete(key);
  } else {
    matches = findMatches(current.parts, query, currency);
    if (results.size >= RESULT_CACHE_SIZE) results.delete(results.keys().next().value!);
  }
  results.set(key, matches);
  const start = (query.page - 1) * query.size;
  const rows = matches.slice(start, start + query.size).map(({ entry, hfe }) => toListRow(entry, hfe, currency));
  return { rows, total: matches.length, page: query.page, pageSize: query.size, packages: current.packages, priceCurrency: currency };
}

function toListRow(entry: CachedPart, hfe: number | null, currency: string | null): PartListRow {
  const { part } = entry;
  return {
    id: part.id,
    manufacturer: part.manufacturer,
    partNumber: part.partNumber,
    polarity: part.polarity,
    packageName: part.packageName,
    configuration: part.configuration,
    vceoVolts: part.vceoVolts,
    icMaxAmps: part.icMaxAmps,
    ptotWatts: part.ptotWatts,
    ftHz: part.ftHz,
    lifecycle: part.lifecycle,
    hfeAtChosen: hfe,
    hfeSummary: entry.hfeSummary,
    offerCount: entry.offerCount,
    bestUnitPrice: priceIn(entry, currency),
    stockTotal: entry.stockTotal,
    flags: entry.flags,
  };
}

const FLAG_NOTES: Record<DataQualityFlag, string> = {
  "no-min-gain": "The datasheet quotes no minimum hFE: worst-case gain is taken from typical values with a stated factor.",
  "early-unknown": "No Early voltage is known, so voltage gain and output resistance cannot be checked.",
  "single-gain-point": "Gain is quoted at only one collector current; gain elsewhere is held from that point.",
  "stale-datasheet": `The datasheet revision is unknown or older than ${DEFAULT_STALE_AFTER_YEARS} years.`,
};

export function dataQualityOf(part: PartSpec): { flags: string[]; notes: string[] } {
  const { flags } = assessDataQuality(part, { todayIso: today() });
  return { flags, notes: flags.map((f) => FLAG_NOTES[f]) };
}

interface RevisionSql {
  id: string;
  created_at: Date;
  action: "intake" | "rollback" | "edit";
  intake_id: string | null;
  file_name: string | null;
  editor_name: string | null;
  before: PartSpec | null;
  after: PartSpec | null;
}

/** Every field the revision changed; a created part lists every field it was given. */
function revisionChanges(before: PartSpec | null, after: PartSpec | null): PartRevisionView["changes"] {
  if (!after) return [];
  if (!before) {
    return Object.entries(after)
      .filter(([, value]) => value !== null && !(Array.isArray(value) && value.length === 0))
      .map(([field, value]) => ({ field, before: null, after: value }));
  }
  return listPartChanges(before, after);
}

/** One part with its offers, revision history (newest first) and data-quality flags; null when unknown. */
export async function getPart(id: string): Promise<PartDetail | null> {
  const sequelize = db().sequelize;
  const [row] = await sequelize.query<PartRow>(`SELECT ${PART_SELECT} FROM parts p WHERE p.id = $1`, { bind: [id], type: QueryTypes.SELECT });
  if (!row) return null;
  const part = rowToPart(row);
  const [offerRows, revisionRows, catalogueVersion] = await Promise.all([
    sequelize.query<OfferRowSql>(`SELECT ${OFFER_SELECT} FROM offers o WHERE o.part_id = $1 ORDER BY lower(o.supplier)`, {
      bind: [id],
      type: QueryTypes.SELECT,
    }),
    sequelize.query<RevisionSql>(
      `SELECT r.id, r.created_at, r.action, r.intake_id, i.file_name, u.display_name AS editor_name, r.before, r.after
       FROM part_revisions r LEFT JOIN intakes i ON i.id = r.intake_id LEFT JOIN users u ON u.id = r.editor_id
       WHERE r.part_id = $1 ORDER BY r.id DESC`,
      { bind: [id], type: QueryTypes.SELECT },
    ),
    readCatalogueVersion(),
  ]);
  const revisions = revisionRows.map(
    (r): PartRevisionView => ({
      id: String(r.id),
      createdAt: new Date(r.created_at).toISOString(),
      action: r.action,
      source:
        r.intake_id !== null
          ? { kind: "intake", intakeId: r.intake_id, fileName: r.file_name ?? "" }
          : { kind: "edit", editorName: r.editor_name ?? "a former librarian" },
      changes: revisionChanges(r.before, r.after),
    }),
  );
  return { part, offers: offerRows.map(rowToOffer), revisions, dataQuality: dataQualityOf(part), catalogueVersion };
}

/** A librarian's correction of one part: one revision, one transaction. */
export async function updatePart(id: string, spec: PartSpec, editor: { id: string }): Promise<{ ok: true } | { ok: false; message: string }> {
  const sequelize = db().sequelize;
  return sequelize.transaction(async (transaction) => {
    await lockCatalogue(transaction);
    const [row] = await sequelize.query<PartRow>(`SELECT ${PART_SELECT} FROM parts p WHERE p.id = $1 FOR UPDATE`, {
      bind: [id],
      type: QueryTypes.SELECT,
      transaction,
    });
    if (!row) return { ok: false as const, message: "That part is no longer in the catalogue." };
    const before = specOf(rowToPart(row));
    const after = normaliseSpec(spec);
    if (listPartChanges(before, after).length === 0) return { ok: true as const };
    const [clash] = await sequelize.query<{ id: string }>(
      `SELECT id FROM parts WHERE manufacturer_key = $1 AND part_number_key = $2 AND id <> $3`,
      { bind: [identityKey(after.manufacturer), identityKey(after.partNumber), id], type: QueryTypes.SELECT, transaction },
    );
    if (clash) {
      return { ok: false as const, message: `The catalogue already has ${after.partNumber} by ${after.manufacturer}: a part is identified by manufacturer and part number.` };
    }
    await updateParts([{ id, spec: after }], transaction);
    await insertPartRevisions([{ partId: id, action: "edit", intakeId: null, editorId: editor.id, before, after }], transaction);
    await bumpCatalogueVersion(transaction);
    return { ok: true as const };
  });
}
