// Shared SQL for the catalogue tables: part rows <-> PartSpec, bulk writes in one statement, the version row.
import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { PoolClient } from "pg";
import { from as copyFrom } from "pg-copy-streams";
import type { Transaction } from "sequelize";
import { QueryTypes } from "sequelize";
import type { CataloguePart, GainPoint, Offer, PartSpec, SaturationPoint } from "#app/domain/part.ts";
import { identityKey } from "#app/domain/intake/identity.ts";
import { partKey } from "#app/domain/part.ts";
import { db } from "#app/lib/db.server.ts";

/** PartSpec field -> parts column and its PostgreSQL type, in PartSpec order. */
export const PART_FIELD_COLUMNS: ReadonlyArray<[keyof PartSpec, string, string]> = [
  ["manufacturer", "manufacturer", "text"],
  ["partNumber", "part_number", "text"],
  ["polarity", "polarity", "text"],
  ["packageName", "package_name", "text"],
  ["configuration", "configuration", "text"],
  ["vceoVolts", "vceo_volts", "float8"],
  ["vcboVolts", "vcbo_volts", "float8"],
  ["veboVolts", "vebo_volts", "float8"],
  ["icMaxAmps", "ic_max_amps", "float8"],
  ["ptotWatts", "ptot_watts", "float8"],
  ["ptotReference", "ptot_reference", "text"],
  ["tjMaxC", "tj_max_c", "float8"],
  ["rthJaCPerW", "rth_ja_c_per_w", "float8"],
  ["rthJcCPerW", "rth_jc_c_per_w", "float8"],
  ["gainPoints", "gain_points", "jsonb"],
  ["saturationPoints", "saturation_points", "jsonb"],
  ["vbeOnVolts", "vbe_on_volts", "float8"],
  ["ftHz", "ft_hz", "float8"],
  ["cobFarads", "cob_farads", "float8"],
  ["earlyVolts", "early_volts", "float8"],
  ["lifecycle", "lifecycle", "text"],
  ["datasheetUrl", "datasheet_url", "text"],
  ["datasheetRevisionDate", "datasheet_revision_date", "date"],
];

export const PART_SELECT = [
  "p.id",
  ...PART_FIELD_COLUMNS.map(([, column, type]) => (type === "date" ? `p.${column}::text AS ${column}` : `p.${column}`)),
].join(", ");

export type PartRow = Record<string, unknown> & { id: string };

/** Points are kept sorted by IC, the order the gain curve and the part page read them in. */
export function sortedPoints<P extends GainPoint | SaturationPoint>(points: readonly P[]): P[] {
  return [...points].sort((a, b) => a.icAmps - b.icAmps);
}

export function rowToPart(row: PartRow): CataloguePart {
  const spec = {} as Record<string, unknown>;
  for (const [field, column] of PART_FIELD_COLUMNS) spec[field] = row[column] ?? null;
  return { id: row.id, ...(spec as unknown as PartSpec) };
}

/** Sorts a spec's point lists where they are (for specs this code just parsed or decoded and owns). */
export function normaliseSpecInPlace(spec: PartSpec): PartSpec {
  spec.gainPoints.sort((a, b) => a.icAmps - b.icAmps);
  spec.saturationPoints.sort((a, b) => a.icAmps - b.icAmps);
  return spec;
}

/** A spec with its point lists sorted, as stored and as recorded in revisions. */
export function normaliseSpec(spec: PartSpec): PartSpec {
  return { ...spec, gainPoints: sortedPoints(spec.gainPoints), saturationPoints: sortedPoints(spec.saturationPoints) };
}

export function specOf(part: CataloguePart): PartSpec {
  const { id: _id, ...spec } = part;
  return spec;
}

// COPY text format: \N is null; backslash, tab and line breaks are escaped.
function copyCell(type: string, value: unknown): string {
  if (value === undefined || value === null) return "\\N";
  const text = type === "jsonb" ? JSON.stringify(value) : String(value);
  return /[\\\t\n\r]/.test(text) ? text.replace(/\\/g, "\\\\").replace(/\t/g, "\\t").replace(/\n/g, "\\n").replace(/\r/g, "\\r") : text;
}

// Lines are sent in batches of about this many characters.
const COPY_BATCH_CHARS = 256 * 1024;

function* copyLines(columns: ReadonlyArray<[name: string, type: string]>, rows: Iterable<readonly unknown[]>): Generator<string> {
  let batch = "";
  for (const row of rows) {
    let line = "";
    for (let c = 0; c < columns.length; c += 1) line += (c === 0 ? "" : "\t") + copyCell(columns[c]![1], row[c]);
    batch += `${line}\n`;
    if (batch.length >= COPY_BATCH_CHARS) {
      yield batch;
      batch = "";
    }
  }
  if (batch) yield batch;
}

/** The PostgreSQL client a Sequelize transaction runs on, for COPY. */
function clientOf(transaction: Transaction): PoolClient {
  return (transaction as unknown as { connection: PoolClient }).connection;
}

/**
 * Writes many rows with COPY on the transaction's own connection: the same bulk path PostgreSQL offers
 * for loading, streamed in batches so a 100k-row intake never builds one giant statement.
 */
export async function copyRows(
  table: string,
  columns: ReadonlyArray<[name: string, type: string]>,
  rows: Iterable<readonly unknown[]>,
  transaction: Transaction,
): Promise<void> {
  const names = columns.map(([name]) => name).join(", ");
  const stream = clientOf(transaction).query(copyFrom(`COPY ${table} (${names}) FROM STDIN`));
  await pipeline(Readable.from(copyLines(columns, rows)), stream);
}

let scratchCounter = 0;

/** COPYs rows into a scratch table shaped like `table` (dropped at commit) and returns its name. */
async function copyToScratch(
  table: string,
  columns: ReadonlyArray<[name: string, type: string]>,
  rows: Iterable<readonly unknown[]>,
  transaction: Transaction,
): Promise<string> {
  scratchCounter += 1;
  const scratch = `scratch_${table}_${scratchCounter}`;
  await db().sequelize.query(`CREATE TEMP TABLE ${scratch} (LIKE ${table} INCLUDING DEFAULTS) ON COMMIT DROP`, { transaction });
  await copyRows(scratch, columns, rows, transaction);
  return scratch;
}

/** Inserts many rows; with `conflict` (an ON CONFLICT clause) they go through a scratch table first. */
export async function insertMany(
  table: string,
  columns: ReadonlyArray<[name: string, type: string]>,
  rows: ReadonlyArray<readonly unknown[]>,
  transaction: Transaction,
  conflict = "",
): Promise<void> {
  if (rows.length === 0) return;
  if (!conflict) return copyRows(table, columns, rows, transaction);
  const scratch = await copyToScratch(table, columns, rows, transaction);
  const names = columns.map(([name]) => name).join(", ");
  await db().sequelize.query(`INSERT INTO ${table} (${names}) SELECT ${names} FROM ${scratch} ${conflict}`, { transaction });
}

// The identity keys are written with every part: PostgreSQL compares them and never folds names itself.
const PART_WRITE_COLUMNS: Array<[string, string]> = [
  ["id", "uuid"],
  ["manufacturer_key", "text"],
  ["part_number_key", "text"],
  ...PART_FIELD_COLUMNS.map(([, column, type]) => [column, type] as [string, string]),
];

function* partCells(parts: ReadonlyArray<{ id: string; spec: PartSpec }>): Generator<unknown[]> {
  for (const { id, spec } of parts) {
    const normal = normaliseSpec(spec);
    yield [id, identityKey(spec.manufacturer), identityKey(spec.partNumber), ...PART_FIELD_COLUMNS.map(([field]) => normal[field])];
  }
}

export async function insertParts(parts: ReadonlyArray<{ id: string; spec: PartSpec }>, transaction: Transaction): Promise<void> {
  if (parts.length === 0) return;
  await copyRows("parts", PART_WRITE_COLUMNS, partCells(parts), transaction);
}

/** Overwrites every field of the given parts with their new specs. */
export async function updateParts(parts: ReadonlyArray<{ id: string; spec: PartSpec }>, transaction: Transaction): Promise<void> {
  if (parts.length === 0) return;
  const scratch = await copyToScratch("parts", PART_WRITE_COLUMNS, partCells(parts), transaction);
  const sets = PART_WRITE_COLUMNS.slice(1)
    .map(([column]) => `${column} = u.${column}`)
    .join(", ");
  await db().sequelize.query(`UPDATE parts p SET ${sets}, updated_at = now() FROM ${scratch} u WHERE p.id = u.id`, { transaction });
}

export async function deleteParts(ids: readonly string[], transaction: Transaction): Promise<void> {
  if (ids.length === 0) return;
  await db().sequelize.query(`DELETE FROM parts WHERE id = ANY($1::uuid[])`, { bind: [ids], transaction });
}

export interface PartRevisionInsert {
  partId: string;
  action: "intake" | "rollback" | "edit";
  intakeId: string | null;
  editorId: string | null;
  before: PartSpec | null;
  after: PartSpec | null;
}

function* revisionCells(revisions: readonly PartRevisionInsert[]): Generator<unknown[]> {
  for (const r of revisions) yield [r.partId, r.action, r.intakeId, r.editorId, r.before && normaliseSpec(r.before), r.after && normaliseSpec(r.after)];
}

export async function insertPartRevisions(revisions: readonly PartRevisionInsert[], transaction: Transaction): Promise<void> {
  if (revisions.length === 0) return;
  await copyRows(
    "part_revisions",
    [
      ["part_id", "uuid"],
      ["action", "text"],
      ["intake_id", "uuid"],
      ["editor_id", "uuid"],
      ["before", "jsonb"],
      ["after", "jsonb"],
    ],
    revisionCells(revisions),
    transaction,
  );
}

/** The stored part rows as PartSpec JSON, built by PostgreSQL itself (same keys as PartSpec). */
const PART_AS_JSON = `jsonb_build_object(${PART_FIELD_COLUMNS.map(([field, column, type]) => `'${field}', ${type === "date" ? `p.${column}::text` : `p.${column}`}`).join(", ")})`;

/**
 * One "created" revision per part, its `after` taken from the row just written: exactly what was stored,
 * and no second copy of every value sent over the wire (a 100k-row intake saves most of a second).
 */
export async function insertCreationRevisions(partIds: readonly string[], intakeId: string, transaction: Transaction): Promise<void> {
  if (partIds.length === 0) return;
  await db().sequelize.query(
    `INSERT INTO part_revisions (part_id, action, intake_id, before, after)
     SELECT p.id, 'intake', $1, NULL, ${PART_AS_JSON} FROM parts p WHERE p.id = ANY($2::uuid[]) ORDER BY p.id`,
    { bind: [intakeId, partIds], transaction },
  );
}

/** SQL for one PART_FIELD_COLUMNS value of a spec stored by `encodeSpec` (a json array), typed for its column. */
function encodedFieldSql(encoded: string, index: number, type: string): string {
  const field = PART_FIELD_COLUMNS[index]![0];
  if (field === "gainPoints" || field === "saturationPoints") {
    const keys = field === "gainPoints" ? GAIN_KEYS : SAT_KEYS;
    const point = keys.map((key, j) => `'${key}', pt.v->${j}`).join(", ");
    // A lone function scan feeds the aggregate in array order; a per-row ORDER BY would start a sort 200k times.
    return `(SELECT COALESCE(jsonb_agg(jsonb_build_object(${point})), '[]'::jsonb) FROM jsonb_array_elements(${encoded}->${index}) AS pt(v))`;
  }
  return `(${encoded}->>${index})::${type}`;
}

/**
 * Inserts one part per encoded spec that `source` (a FROM item with a jsonb column `spec` and text columns
 * `manufacturer_key`, `part_number_key`) yields, each with its "created" revision, in one statement inside
 * PostgreSQL: no spec crosses the wire again. Returns how many.
 */
export async function insertPartsFromEncoded(source: string, bind: unknown[], intakeIdParam: string, transaction: Transaction): Promise<number> {
  const columns = PART_FIELD_COLUMNS.map(([, column]) => column).join(", ");
  const values = PART_FIELD_COLUMNS.map(([, , type], i) => encodedFieldSql("s.spec", i, type)).join(",\n      ");
  // The new rows and the revisions' sort (100k rows) stay in the server's memory instead of spilling to disk.
  await db().sequelize.query(`SET LOCAL work_mem = '256MB'`, { transaction });
  const [rows] = (await db().sequelize.query(
    `WITH created AS (
       INSERT INTO parts (id, manufacturer_key, part_number_key, ${columns})
       SELECT gen_random_uuid(), s.manufacturer_key, s.part_number_key, ${values} FROM ${source}
       RETURNING *
     ), revised AS (
       INSERT INTO part_revisions (part_id, action, intake_id, before, after)
       SELECT p.id, 'intake', ${intakeIdParam}, NULL, ${PART_AS_JSON} FROM created p ORDER BY p.id
     )
     SELECT count(*)::int AS created FROM created`,
    { bind, transaction },
  )) as [Array<{ created: number }>, unknown];
  return rows[0]?.created ?? 0;
}

// Identity look-ups beyond this many parts are sent in several statements.
const CHUNK_ROWS = 20_000;

/** Parts of the catalogue with these identities (manufacturer + part number as look-alike names), by part key. */
export async function findPartsByKeys(
  identities: ReadonlyArray<{ manufacturer: string; partNumber: string }>,
  transaction?: Transaction,
): Promise<Map<string, CataloguePart>> {
  const found = new Map<string, CataloguePart>();
  for (let start = 0; start < identities.length; start += CHUNK_ROWS) {
    const chunk = identities.slice(start, start + CHUNK_ROWS);
    const rows = await db().sequelize.query<PartRow>(
      `SELECT ${PART_SELECT} FROM parts p
       JOIN unnest($1::text[], $2::text[]) AS k(m, n) ON p.manufacturer_key = k.m AND p.part_number_key = k.n`,
      {
        bind: [chunk.map((i) => identityKey(i.manufacturer)), chunk.map((i) => identityKey(i.partNumber))],
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    for (const row of rows) {
      const part = rowToPart(row);
      found.set(partKey(part.manufacturer, part.partNumber), part);
    }
  }
  return found;
}

export type OfferRowSql = {
  id: string;
  part_id: string;
  supplier: string;
  supplier_sku: string | null;
  stock: number;
  minimum_order: number;
  order_multiple: number;
  price_breaks: Offer["priceBreaks"];
  currency: string;
  lead_time_days: number | null;
  as_of: string;
};

export const OFFER_SELECT =
  "o.id, o.part_id, o.supplier, o.supplier_sku, o.stock, o.minimum_order, o.order_multiple, o.price_breaks, o.currency, o.lead_time_days, o.as_of::text AS as_of";

export function rowToOffer(row: OfferRowSql): Offer & { id: string } {
  return {
    id: row.id,
    supplier: row.supplier,
    supplierSku: row.supplier_sku,
    stock: Number(row.stock),
    minimumOrder: Number(row.minimum_order),
    orderMultiple: Number(row.order_multiple),
    priceBreaks: [...row.price_breaks].sort((a, b) => a.quantity - b.quantity),
    currency: row.currency,
    leadTimeDays: row.lead_time_days === null ? null : Number(row.lead_time_days),
    asOf: row.as_of,
  };
}

/** Locks the catalogue for writing (every commit, rollback and edit takes it first, so they run one at a time). */
export async function lockCatalogue(transaction: Transaction): Promise<void> {
  await db().sequelize.query(`SELECT version FROM catalogue_version WHERE id = 1 FOR UPDATE`, { transaction, type: QueryTypes.SELECT });
}

export async function bumpCatalogueVersion(transaction: Transaction): Promise<void> {
  await db().sequelize.query(`UPDATE catalogue_version SET version = version + 1, changed_at = clock_timestamp() WHERE id = 1`, { transaction });
}

export async function readCatalogueVersion(transaction?: Transaction): Promise<number> {
  const [row] = await db().sequelize.query<{ version: string }>(`SELECT version FROM catalogue_version WHERE id = 1`, { type: QueryTypes.SELECT, transaction });
  return Number(row?.version ?? 0);
}

const GAIN_KEYS = ["icAmps", "vceVolts", "hfeMin", "hfeTyp", "hfeMax", "tempC"] as const;
const SAT_KEYS = ["icAmps", "ibAmps", "vceSatMaxVolts", "vceSatTypVolts", "vbeSatVolts"] as const;

/** A part spec as a positional array (PART_FIELD_COLUMNS order, points as arrays): a third of the JSON, for stored parses. */
export function encodeSpec(spec: PartSpec): unknown[] {
  return PART_FIELD_COLUMNS.map(([field]) => {
    if (field === "gainPoints") return spec.gainPoints.map((p) => GAIN_KEYS.map((k) => p[k]));
    if (field === "saturationPoints") return spec.saturationPoints.map((p) => SAT_KEYS.map((k) => p[k]));
    return spec[field];
  });
}

export function decodeSpec(encoded: readonly unknown[]): PartSpec {
  const spec: Record<string, unknown> = {};
  PART_FIELD_COLUMNS.forEach(([field], i) => {
    const value = encoded[i] ?? null;
    if (field === "gainPoints" || field === "saturationPoints") {
      const keys = field === "gainPoints" ? GAIN_KEYS : SAT_KEYS;
      spec[field] = (value as unknown[][]).map((point) => Object.fromEntries(keys.map((k, j) => [k, point[j] ?? null])));
    } else {
      spec[field] = value;
    }
  });
  return spec as unknown as PartSpec;
}
