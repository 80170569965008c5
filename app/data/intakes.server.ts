// Intakes: preview an uploaded file (stored byte for byte with its parse), then commit, discard or roll back.
import { randomUUID } from "node:crypto";
import { QueryTypes, type Transaction } from "sequelize";
import { findChangedRow, type ChangeSetRow } from "#app/domain/intake/change-set.ts";
import { compareWithCatalogue, markCleared, matchOffersToParts, type FieldChange } from "#app/domain/intake/compare.ts";
import { identityKey } from "#app/domain/intake/identity.ts";
import { mergeOffer } from "#app/domain/intake/merge.ts";
import type { OfferRow } from "#app/domain/intake/offer-schema.ts";
import { parseIntakeFile } from "#app/domain/intake/parse-intake.ts";
import { countRejectedRows, hasFileError, type IntakeKind, type IntakeProblem, type IntakeRow } from "#app/domain/intake/problems.ts";
import type { IntakeReading } from "#app/domain/intake/readings.ts";
import { partKey, type Offer, type PartSpec } from "#app/domain/part.ts";
import { db } from "#app/lib/db.server.ts";
import { queueIntakeReport } from "#app/lib/jobs.server.ts";
import {
  bumpCatalogueVersion,
  copyRows,
  decodeSpec,
  deleteParts,
  encodeSpec,
  findPartsByKeys,
  insertCreationRevisions,
  insertMany,
  insertPartRevisions,
  insertPartsFromEncoded,
  lockCatalogue,
  normaliseSpecInPlace,
  readCatalogueVersion,
  OFFER_SELECT,
  rowToOffer,
  specOf,
  updateParts,
  type OfferRowSql,
  type PartRevisionInsert,
} from "./catalogue-store.server.ts";
import { findMissingParts, type MissingPart } from "./intake-missing.server.ts";

export type IntakeState = "previewed" | "committed" | "discarded" | "rolled-back";

export interface IntakeCountsView {
  new: number;
  changed: number;
  unchanged: number;
  rejected: number;
  warnings: number;
}

export interface IntakeView {
  id: string;
  kind: IntakeKind;
  fileName: string;
  sizeBytes: number;
  state: IntakeState;
  uploadedBy: { id: string; name: string };
  createdAt: string;
  committedAt: string | null;
  discardedAt: string | null;
  rolledBackAt: string | null;
  counts: IntakeCountsView;
  /** Previewed, the file itself was readable, and at least one row would change the catalogue. */
  canCommit: boolean;
}

export interface IntakeChangeView {
  row: number;
  status: "new" | "changed" | "unchanged";
  manufacturer: string;
  partNumber: string;
  /** `cleared`: an empty cell in a column the file has cleared the value (absent columns change nothing). */
  fields: Array<{ field: string; before: unknown; after: unknown; cleared?: true }>;
}

export interface IntakeDetail extends IntakeView {
  problems: IntakeProblem[];
  /** How many problems the intake has; `problems` holds at most DETAIL_LIMIT of them. */
  problemsTotal: number;
  changes: IntakeChangeView[];
  /** How many accepted rows the intake has; `changes` holds at most DETAIL_LIMIT of them (changed and new first). */
  changesTotal: number;
  /** How cells were read when not taken literally, grouped by column and text. */
  readings: IntakeReading[];
  /** Cells read in ways past the listed readings. */
  readingsNotListed: number;
  /** Catalogue parts of the re-imported manufacturers that the file leaves out (kept as they are). */
  missingParts: MissingPart[];
  missingTotal: number;
}

export type IntakeOperationResult =
  | { ok: true; intake: IntakeView }
  | { ok: false; code: "not-found" | "wrong-state" | "blocked" | "stale"; message: string };

/** The most problems and row changes one intake answer carries; a 100k-row file stays a readable answer. */
export const DETAIL_LIMIT = 2000;

interface IntakeSql {
  id: string;
  kind: IntakeKind;
  file_name: string;
  size_bytes: number;
  state: IntakeState;
  file_refused: boolean;
  uploaded_by: string;
  uploader_name: string | null;
  created_at: Date;
  committed_at: Date | null;
  discarded_at: Date | null;
  rolled_back_at: Date | null;
  new_count: number;
  changed_count: number;
  unchanged_count: number;
  rejected_count: number;
  warning_count: number;
  problem_count: number;
  compared_at_version: string;
}

const INTAKE_SELECT = `i.id, i.kind, i.file_name, i.size_bytes, i.state, i.file_refused, i.uploaded_by, u.display_name AS uploader_name,
  i.created_at, i.committed_at, i.discarded_at, i.rolled_back_at, i.new_count, i.changed_count, i.unchanged_count,
  i.rejected_count, i.warning_count, i.problem_count, i.compared_at_version`;

const iso = (value: Date | null) => (value ? new Date(value).toISOString() : null);

function toView(row: IntakeSql): IntakeView {
  const counts = { new: row.new_count, changed: row.changed_count, unchanged: row.unchanged_count, rejected: row.rejected_count, warnings: row.warning_count };
  return {
    id: row.id,
    kind: row.kind,
    fileName: row.file_name,
    sizeBytes: row.size_bytes,
    state: row.state,
    uploadedBy: { id: row.uploaded_by, name: row.uploader_name ?? "a former librarian" },
    createdAt: new Date(row.created_at).toISOString(),
    committedAt: iso(row.committed_at),
    discardedAt: iso(row.discarded_at),
    rolledBackAt: iso(row.rolled_back_at),
    counts,
    canCommit: row.state === "previewed" && !row.file_refused && counts.new + counts.changed > 0,
  };
}

async function selectIntake(id: string, transaction?: Transaction, lock = false): Promise<IntakeSql | null> {
  const [row] = await db().sequelize.query<IntakeSql>(
    `SELECT ${INTAKE_SELECT} FROM intakes i LEFT JOIN users u ON u.id = i.uploaded_by WHERE i.id = $1 ${lock ? "FOR UPDATE OF i" : ""}`,
    { bind: [id], type: QueryTypes.SELECT, transaction },
  );
  return row ?? null;
}

// ---- comparing rows with the catalogue --------------------------------------------------------

const OFFER_FIELDS: Array<keyof Offer> = ["supplier", "supplierSku", "stock", "minimumOrder", "orderMultiple", "priceBreaks", "currency", "leadTimeDays", "asOf"];

function normaliseOffer(offer: Offer): Offer {
  return { ...offer, priceBreaks: [...offer.priceBreaks].sort((a, b) => a.quantity - b.quantity) };
}

function offerChanges(before: Offer | null, after: Offer, empty?: readonly string[]): FieldChange[] {
  const changes: Array<{ field: string; before: unknown; after: unknown }> = [];
  for (const field of OFFER_FIELDS) {
    const a = before ? before[field] : null;
    const b = after[field];
    if (JSON.stringify(a ?? null) !== JSON.stringify(b ?? null)) changes.push({ field, before: a ?? null, after: b ?? null });
  }
  return markCleared(changes, empty) as unknown as FieldChange[];
}

interface ComparedRowRecord {
  row: number;
  status: "new" | "changed" | "unchanged";
  value: PartSpec | OfferRow;
  changes: FieldChange[];
}

interface Comparison {
  rows: ComparedRowRecord[];
  counts: { new: number; changed: number; unchanged: number };
  extraProblems: IntakeProblem[];
}

type ExistingParts = Map<string, { id: string; spec: PartSpec }>;

async function findExisting(specs: readonly PartSpec[], transaction?: Transaction): Promise<ExistingParts> {
  const existing: ExistingParts = new Map();
  for (const [key, part] of await findPartsByKeys(specs, transaction)) existing.set(key, { id: part.id, spec: specOf(part) });
  return existing;
}

/**
 * Rows the parse (or the stored preview) owns: their point lists are sorted where they are. With `present` (the
 * file's columns) a row is merged into its catalogue part, so columns the file lacks stay as they are.
 */
async function compareParts(
  rows: ReadonlyArray<IntakeRow<PartSpec>>,
  transaction?: Transaction,
  present?: ReadonlySet<string>,
): Promise<Comparison & { existing: ExistingParts }> {
  const normal = rows.map(({ row, value, empty }) => ({ row, value: normaliseSpecInPlace(value), empty }));
  const found = await findPartsByKeys(
    normal.map((r) => r.value),
    transaction,
  );
  const existing: ExistingParts = new Map();
  const specs = new Map<string, PartSpec>();
  for (const [key, part] of found) {
    existing.set(key, { id: part.id, spec: specOf(part) });
    specs.set(key, specOf(part));
  }
  const comparison = compareWithCatalogue(normal, specs, [], present);
  return {
    rows: comparison.rows.map((r) => ({ row: r.row, status: r.status, value: r.value, changes: r.changes })),
    counts: { new: comparison.counts.new, changed: comparison.counts.changed, unchanged: comparison.counts.unchanged },
    extraProblems: [],
    existing,
  };
}

interface OfferTarget {
  partId: string;
  before: (Offer & { id: string }) | null;
}

async function compareOffers(
  rows: ReadonlyArray<IntakeRow<OfferRow>>,
  transaction?: Transaction,
  present?: ReadonlySet<string>,
): Promise<Comparison & { targets: Map<number, OfferTarget> }> {
  const parts = await findPartsByKeys(rows.map((r) => r.value), transaction);
  const extraProblems = matchOffersToParts(rows, new Set(parts.keys()));
  const partIds = [...new Set([...parts.values()].map((p) => p.id))];
  const offerRows = partIds.length
    ? await db().sequelize.query<OfferRowSql>(`SELECT ${OFFER_SELECT} FROM offers o WHERE o.part_id = ANY($1::uuid[])`, {
        bind: [partIds],
        type: QueryTypes.SELECT,
        transaction,
      })
    : [];
  const existing = new Map<string, Offer & { id: string }>();
  for (const row of offerRows) existing.set(`${row.part_id}\u0000${identityKey(row.supplier)}`, rowToOffer(row));
  const counts = { new: 0, changed: 0, unchanged: 0 };
  const compared: ComparedRowRecord[] = [];
  const targets = new Map<number, OfferTarget>();
  for (const { row, value, empty } of rows) {
    const part = parts.get(partKey(value.manufacturer, value.partNumber));
    if (!part) continue;
    const before = existing.get(`${part.id}\u0000${identityKey(value.offer.supplier)}`) ?? null;
    const offer = normaliseOffer(before && present ? mergeOffer(withoutId(before)!, value.offer, present) : value.offer);
    const changes = offerChanges(before && normaliseOffer(before), offer, empty);
    const status = !before ? "new" : changes.length > 0 ? "changed" : "unchanged";
    counts[status] += 1;
    compared.push({ row, status, value: { ...value, offer }, changes: before ? changes : [] });
    targets.set(row, { partId: part.id, before });
  }
  return { rows: compared, counts, extraProblems, targets };
}

// ---- preview ----------------------------------------------------------------------------------

/** Manufacturers (identity keys) the file re-imports: at least one of its rows names a part the catalogue has. */
function reimportedManufacturers(rows: readonly ComparedRowRecord[]): string[] {
  const keys = new Set<string>();
  for (const row of rows) if (row.status !== "new") keys.add(identityKey(row.value.manufacturer));
  return [...keys];
}

/** Parses and compares an uploaded file, storing the file, its problems and its rows; the catalogue is not touched. */
export async function previewIntake(input: { kind: IntakeKind; fileName: string; bytes: Uint8Array; uploadedBy: string }): Promise<IntakeView> {
  const comparedAtVersion = await readCatalogueVersion();
  const parsed = parseIntakeFile(input.kind, input.bytes, { todayIso: new Date().toISOString().slice(0, 10) });
  const fileRefused = hasFileError(parsed.problems);
  const present = new Set(parsed.presentFields);
  const accepted = fileRefused ? [] : parsed.rows;
  const comparison: Comparison =
    parsed.kind === "parts" ? await compareParts(accepted as typeof parsed.rows, undefined, present) : await compareOffers(accepted as typeof parsed.rows, undefined, present);
  const problems = [...parsed.problems, ...comparison.extraProblems];
  const missing =
    parsed.kind === "parts" && !fileRefused ? await findMissingParts(reimportedManufacturers(comparison.rows), parsed.identities) : { parts: [], total: 0 };
  const id = randomUUID();
  const sequelize = db().sequelize;
  await sequelize.transaction(async (transaction) => {
    const parsedRows = await copyParsedRows(parsed.kind, comparison.rows, transaction);
    await sequelize.query(
      `INSERT INTO intakes (id, kind, file_name, size_bytes, file_bytes, uploaded_by, state, file_refused, new_count, changed_count,
         unchanged_count, rejected_count, warning_count, problem_count, parsed_rows, compared_at_version, readings, readings_not_listed,
         missing_parts, missing_count, created_at, updated_at)
       VALUES ($1, $2, $3, $4, $5, $6, 'previewed', $7, $8, $9, $10, $11, $12, $13, ${parsedRows}, $14, $15, $16, $17, $18,
         clock_timestamp(), clock_timestamp())`,
      {
        bind: [
          id,
          input.kind,
          input.fileName,
          input.bytes.byteLength,
          Buffer.from(input.bytes.buffer, input.bytes.byteOffset, input.bytes.byteLength),
          input.uploadedBy,
          fileRefused,
          comparison.counts.new,
          comparison.counts.changed,
          comparison.counts.unchanged,
          countRejectedRows(problems),
          problems.filter((p) => p.severity === "warning").length,
          problems.length,
          comparedAtVersion,
          JSON.stringify(parsed.readings),
          parsed.readingsNotListed,
          JSON.stringify(missing.parts),
          missing.total,
        ],
        transaction,
      },
    );
    await insertMany(
      "intake_problems",
      [
        ["intake_id", "uuid"],
        ["position", "int4"],
        ["row_number", "int4"],
        ["column_name", "text"],
        ["value", "text"],
        ["message", "text"],
        ["severity", "text"],
      ],
      problems.map((p, i) => [id, i, p.row, p.column, p.value, p.message, p.severity]),
      transaction,
    );
  });
  const stored = await selectIntake(id);
  return toView(stored!);
}

// ---- reads ------------------------------------------------------------------------------------

export const INTAKES_PAGE_SIZE = 50;

export interface IntakeList {
  intakes: IntakeView[];
  total: number;
  page: number;
  pageSize: number;
}

/** One page of every intake, newest first. */
export async function listIntakes(page = 1, pageSize = INTAKES_PAGE_SIZE): Promise<IntakeList> {
  const sequelize = db().sequelize;
  const [rows, [counted]] = await Promise.all([
    sequelize.query<IntakeSql>(
      `SELECT ${INTAKE_SELECT} FROM intakes i LEFT JOIN users u ON u.id = i.uploaded_by ORDER BY i.created_at DESC, i.id DESC LIMIT $1 OFFSET $2`,
      { bind: [pageSize, (page - 1) * pageSize], type: QueryTypes.SELECT },
    ),
    sequelize.query<{ total: number }>(`SELECT count(*)::int AS total FROM intakes`, { type: QueryTypes.SELECT }),
  ]);
  return { intakes: rows.map(toView), total: counted?.total ?? 0, page, pageSize };
}

interface ProblemSql {
  row_number: number | null;
  column_name: string | null;
  value: string | null;
  message: string;
  severity: "error" | "warning";
}

// Parts carry their identity keys, so a commit inserts new parts inside PostgreSQL with the app's keys.
type StoredRow = [row: number, status: "new" | "changed" | "unchanged", value: unknown, changes: FieldChange[], keys?: [string, string]];

// Row by row, so the positional form of one row is garbage before the next is built (a 100k-row file stays lean).
function* encodeRows(kind: IntakeKind, rows: readonly ComparedRowRecord[]): Generator<[number, string]> {
  for (let n = 0; n < rows.length; n += 1) {
    const r = rows[n]!;
    const spec = r.value as PartSpec;
    const stored: StoredRow =
      kind === "parts"
        ? [r.row, r.status, encodeSpec(spec), r.changes, [identityKey(spec.manufacturer), identityKey(spec.partNumber)]]
        : [r.row, r.status, r.value, r.changes];
    yield [n, JSON.stringify(stored)];
  }
}

let parsedRowsScratch = 0;

/**
 * COPYs the stored form of the rows into a scratch table and returns the SQL that aggregates them into one
 * JSON array: the 100k-row array is never one string in this process, nor one bind parameter.
 */
async function copyParsedRows(kind: IntakeKind, rows: readonly ComparedRowRecord[], transaction: Transaction): Promise<string> {
  parsedRowsScratch += 1;
  const scratch = `scratch_parsed_rows_${parsedRowsScratch}`;
  await db().sequelize.query(`CREATE TEMP TABLE ${scratch} (n int4 NOT NULL, r json NOT NULL) ON COMMIT DROP`, { transaction });
  await copyRows(
    scratch,
    [
      ["n", "int4"],
      ["r", "json"],
    ],
    encodeRows(kind, rows),
    transaction,
  );
  return `(SELECT COALESCE(json_agg(r ORDER BY n), '[]'::json) FROM ${scratch})`;
}

function decodeRows(kind: IntakeKind, stored: readonly StoredRow[]): ComparedRowRecord[] {
  return stored.map(([row, status, value, changes]) => ({ row, status, value: kind === "parts" ? decodeSpec(value as unknown[]) : (value as OfferRow), changes }));
}

async function readStoredRows(intake: IntakeSql, transaction?: Transaction): Promise<ComparedRowRecord[]> {
  const [row] = await db().sequelize.query<{ parsed_rows: StoredRow[] }>(`SELECT parsed_rows FROM intakes WHERE id = $1`, {
    bind: [intake.id],
    type: QueryTypes.SELECT,
    transaction,
  });
  return decodeRows(intake.kind, row?.parsed_rows ?? []);
}

// The stored rows, each with its position, as a FROM item (PostgreSQL reads the JSON, this process does not).
const STORED_ROWS = `intakes i CROSS JOIN LATERAL json_array_elements(i.parsed_rows) WITH ORDINALITY AS s(stored, n)`;

/** The stored rows that are not new, in file order: all a commit needs in this process when it can reuse the preview. */
async function readStoredRowsExceptNew(intake: IntakeSql, transaction: Transaction): Promise<ComparedRowRecord[]> {
  const [row] = await db().sequelize.query<{ parsed_rows: StoredRow[] }>(
    `SELECT COALESCE(json_agg(s.stored ORDER BY s.n), '[]'::json) AS parsed_rows FROM ${STORED_ROWS} WHERE i.id = $1 AND s.stored->>1 <> 'new'`,
    { bind: [intake.id], type: QueryTypes.SELECT, transaction },
  );
  return decodeRows(intake.kind, row?.parsed_rows ?? []);
}

const STATUS_ORDER = { changed: 0, new: 1, unchanged: 2 } as const;

function changeView(kind: IntakeKind, row: ComparedRowRecord): IntakeChangeView {
  let fields: IntakeChangeView["fields"] = row.changes;
  if (row.status === "new") {
    const after = kind === "parts" ? (row.value as PartSpec) : (row.value as OfferRow).offer;
    fields = Object.entries(after)
      .filter(([, value]) => value !== null && !(Array.isArray(value) && value.length === 0))
      .map(([field, value]) => ({ field, before: null, after: value }));
  }
  return { row: row.row, status: row.status, manufacturer: row.value.manufacturer, partNumber: row.value.partNumber, fields };
}

/** One intake with its problems and the change each accepted row makes (or made); null when unknown. */
export async function getIntake(id: string): Promise<IntakeDetail | null> {
  const intake = await selectIntake(id);
  if (!intake) return null;
  const [problems, rows, [notes]] = await Promise.all([
    db().sequelize.query<ProblemSql>(
      `SELECT row_number, column_name, value, message, severity FROM intake_problems WHERE intake_id = $1 ORDER BY position LIMIT ${DETAIL_LIMIT}`,
      { bind: [id], type: QueryTypes.SELECT },
    ),
    readStoredRows(intake),
    db().sequelize.query<{ readings: IntakeReading[]; readings_not_listed: number; missing_parts: MissingPart[]; missing_count: number }>(
      `SELECT readings, readings_not_listed, missing_parts, missing_count FROM intakes WHERE id = $1`,
      { bind: [id], type: QueryTypes.SELECT },
    ),
  ]);
  const shown = [...rows]
    .sort((a, b) => STATUS_ORDER[a.status] - STATUS_ORDER[b.status] || a.row - b.row)
    .slice(0, DETAIL_LIMIT)
    .sort((a, b) => a.row - b.row);
  return {
    ...toView(intake),
    problems: problems.map((p) => ({ row: p.row_number, column: p.column_name, value: p.value, message: p.message, severity: p.severity })),
    problemsTotal: intake.problem_count,
    changes: shown.map((r) => changeView(intake.kind, r)),
    changesTotal: rows.length,
    readings: notes?.readings ?? [],
    readingsNotListed: notes?.readings_not_listed ?? 0,
    missingParts: notes?.missing_parts ?? [],
    missingTotal: notes?.missing_count ?? 0,
  };
}

/** The uploaded file exactly as it arrived, for download. */
export async function getIntakeFile(id: string): Promise<{ fileName: string; bytes: Uint8Array<ArrayBuffer> } | null> {
  const [row] = await db().sequelize.query<{ file_name: string; file_bytes: Buffer }>(`SELECT file_name, file_bytes FROM intakes WHERE id = $1`, {
    bind: [id],
    type: QueryTypes.SELECT,
  });
  return row ? { fileName: row.file_name, bytes: new Uint8Array(row.file_bytes) } : null;
}

// ---- state changes ----------------------------------------------------------------------------

const when = (value: Date | string | null) => (value ? new Date(value).toISOString().replace("T", " ").slice(0, 16) + " UTC" : "an unknown date");

function wrongState(intake: IntakeSql, wanted: string): IntakeOperationResult {
  const states: Record<IntakeState, string> = {
    previewed: "is only previewed",
    committed: `was already committed on ${when(intake.committed_at)}`,
    discarded: `was discarded on ${when(intake.discarded_at)}`,
    "rolled-back": `was already rolled back on ${when(intake.rolled_back_at)}`,
  };
  return { ok: false, code: "wrong-state", message: `The intake "${intake.file_name}" ${states[intake.state]}, so it cannot be ${wanted}.` };
}

async function markCommitted(intakeId: string, byUserId: string, counts: Comparison["counts"], transaction: Transaction): Promise<void> {
  await db().sequelize.query(
    `UPDATE intakes SET state = 'committed', committed_by = $2, committed_at = clock_timestamp(), updated_at = clock_timestamp(),
       new_count = $3, changed_count = $4, unchanged_count = $5 WHERE id = $1`,
    { bind: [intakeId, byUserId, counts.new, counts.changed, counts.unchanged], transaction },
  );
}

/** A commit either writes exactly the previewed change set or is refused with why. */
type CommitOutcome = { counts: Comparison["counts"] } | { stale: string };

function staleMessage(row: ChangeSetRow): string {
  return `The catalogue changed since this preview was made: ${row.value.partNumber} by ${row.value.manufacturer} (row ${row.row}) is no longer as the preview showed it, so a commit now would write a different change. Nothing was committed: preview the file again.`;
}

/** True when no commit, rollback or edit happened since the preview compared (the caller holds the catalogue lock). */
async function catalogueUnchangedSince(intake: IntakeSql, transaction: Transaction): Promise<boolean> {
  return (await readCatalogueVersion(transaction)) === Number(intake.compared_at_version);
}

/**
 * Commits a preview the catalogue has not moved past: its new parts go from the stored rows straight into
 * the catalogue inside PostgreSQL; only the changed rows are read here, for their revisions.
 */
async function commitPreviewedParts(intake: IntakeSql, transaction: Transaction): Promise<Comparison["counts"]> {
  const kept = intake.changed_count + intake.unchanged_count > 0 ? await readStoredRowsExceptNew(intake, transaction) : [];
  const existing = await findExisting(
    kept.map((r) => r.value as PartSpec),
    transaction,
  );
  // The whole array becomes jsonb once, so each column's look-up does not parse its row's text again.
  const created = await insertPartsFromEncoded(
    `(SELECT s.stored->2 AS spec, s.stored->4->>0 AS manufacturer_key, s.stored->4->>1 AS part_number_key
      FROM intakes i CROSS JOIN LATERAL jsonb_array_elements(i.parsed_rows::jsonb) AS s(stored)
      WHERE i.id = $1 AND s.stored->>1 = 'new') s`,
    [intake.id],
    "$1::uuid",
    transaction,
  );
  const changed: Array<{ id: string; spec: PartSpec }> = [];
  const revisions: PartRevisionInsert[] = [];
  const counts = { new: created, changed: 0, unchanged: 0 };
  for (const row of kept) {
    const spec = row.value as PartSpec;
    const before = existing.get(partKey(spec.manufacturer, spec.partNumber));
    counts[row.status] += 1;
    if (row.status === "changed" && before) {
      changed.push({ id: before.id, spec });
      revisions.push({ partId: before.id, action: "intake", intakeId: intake.id, editorId: null, before: before.spec, after: spec });
    }
  }
  await updateParts(changed, transaction);
  await insertPartRevisions(revisions, transaction);
  return counts;
}

/**
 * The catalogue moved since the preview (another commit, a rollback or an edit): the stored rows are compared with
 * it again, and the commit goes ahead only when every row would make exactly the change the preview showed.
 */
async function commitParts(intake: IntakeSql, transaction: Transaction): Promise<CommitOutcome> {
  if (!(await catalogueUnchangedSince(intake, transaction))) {
    const preview = await readStoredRows(intake, transaction);
    const now = await compareParts(
      preview.map((r) => ({ row: r.row, value: r.value as PartSpec })),
      transaction,
    );
    const changed = findChangedRow(preview, now.rows);
    if (changed) return { stale: staleMessage(changed) };
  }
  return { counts: await commitPreviewedParts(intake, transaction) };
}

const OFFER_COLUMNS: Array<[string, string]> = [
  ["id", "uuid"],
  ["part_id", "uuid"],
  ["supplier", "text"],
  ["supplier_sku", "text"],
  ["stock", "int4"],
  ["minimum_order", "int4"],
  ["order_multiple", "int4"],
  ["price_breaks", "jsonb"],
  ["currency", "text"],
  ["lead_time_days", "int4"],
  ["as_of", "date"],
  ["intake_id", "uuid"],
  ["supplier_key", "text"],
];

const OFFER_UPSERT = `ON CONFLICT (part_id, supplier_key) DO UPDATE SET supplier = EXCLUDED.supplier, supplier_sku = EXCLUDED.supplier_sku,
  stock = EXCLUDED.stock, minimum_order = EXCLUDED.minimum_order, order_multiple = EXCLUDED.order_multiple, price_breaks = EXCLUDED.price_breaks,
  currency = EXCLUDED.currency, lead_time_days = EXCLUDED.lead_time_days, as_of = EXCLUDED.as_of, intake_id = EXCLUDED.intake_id, updated_at = now()`;

function offerCells(partId: string, offer: Offer, intakeId: string | null): unknown[] {
  return [randomUUID(), partId, offer.supplier, offer.supplierSku, offer.stock, offer.minimumOrder, offer.orderMultiple, offer.priceBreaks, offer.currency, offer.leadTimeDays, offer.asOf, intakeId, identityKey(offer.supplier)];
}

async function upsertOffers(offers: ReadonlyArray<{ partId: string; offer: Offer; intakeId: string | null }>, transaction: Transaction): Promise<void> {
  await insertMany(
    "offers",
    OFFER_COLUMNS,
    offers.map((o) => offerCells(o.partId, o.offer, o.intakeId)),
    transaction,
    OFFER_UPSERT,
  );
}

interface OfferRevisionInsert {
  partId: string;
  supplier: string;
  action: "intake" | "rollback";
  intakeId: string;
  before: Offer | null;
  after: Offer | null;
}

async function insertOfferRevisions(revisions: readonly OfferRevisionInsert[], transaction: Transaction): Promise<void> {
  await insertMany(
    "offer_revisions",
    [
      ["part_id", "uuid"],
      ["supplier", "text"],
      ["action", "text"],
      ["intake_id", "uuid"],
      ["before", "jsonb"],
      ["after", "jsonb"],
    ],
    revisions.map((r) => [r.partId, r.supplier, r.action, r.intakeId, r.before, r.after]),
    transaction,
  );
}

function withoutId(offer: (Offer & { id: string }) | null): Offer | null {
  if (!offer) return null;
  const { id: _id, ...rest } = offer;
  return rest;
}

async function commitOffers(intake: IntakeSql, transaction: Transaction): Promise<CommitOutcome> {
  const preview = await readStoredRows(intake, transaction);
  const comparison = await compareOffers(
    preview.map((r) => ({ row: r.row, value: r.value as OfferRow })),
    transaction,
  );
  const changed = findChangedRow(preview, comparison.rows);
  if (changed) return { stale: staleMessage(changed) };
  const writes: Array<{ partId: string; offer: Offer; intakeId: string }> = [];
  const revisions: OfferRevisionInsert[] = [];
  for (const row of comparison.rows) {
    if (row.status === "unchanged") continue;
    const target = comparison.targets.get(row.row)!;
    const { offer } = row.value as OfferRow;
    writes.push({ partId: target.partId, offer, intakeId: intake.id });
    revisions.push({ partId: target.partId, supplier: offer.supplier, action: "intake", intakeId: intake.id, before: withoutId(target.before), after: offer });
  }
  await upsertOffers(writes, transaction);
  await insertOfferRevisions(revisions, transaction);
  return { counts: comparison.counts };
}

/**
 * Applies a previewed intake in one transaction. The catalogue lock makes commits touching the same
 * parts run one after the other; each compares against the catalogue as the previous one left it.
 */
export async function commitIntake(id: string, byUserId: string, options: { sendReport?: boolean } = {}): Promise<IntakeOperationResult> {
  const sequelize = db().sequelize;
  const result = await sequelize.transaction(async (transaction): Promise<IntakeOperationResult> => {
    await lockCatalogue(transaction);
    const intake = await selectIntake(id, transaction, true);
    if (!intake) return { ok: false, code: "not-found", message: "No intake has that id." };
    if (intake.state !== "previewed") return wrongState(intake, "committed");
    if (intake.file_refused) {
      return { ok: false, code: "wrong-state", message: `The file "${intake.file_name}" could not be read, so there is nothing to commit. Fix the problems shown and upload it again.` };
    }
    if (intake.new_count + intake.changed_count === 0) {
      return {
        ok: false,
        code: "wrong-state",
        message: `Nothing to commit: no row of "${intake.file_name}" would add or change anything${intake.rejected_count > 0 ? ` (${intake.rejected_count} rejected)` : ""}.`,
      };
    }
    const outcome = intake.kind === "parts" ? await commitParts(intake, transaction) : await commitOffers(intake, transaction);
    if ("stale" in outcome) return { ok: false, code: "stale", message: outcome.stale };
    await markCommitted(id, byUserId, outcome.counts, transaction);
    await bumpCatalogueVersion(transaction);
    return { ok: true, intake: toView((await selectIntake(id, transaction))!) };
  });
  if (result.ok && options.sendReport !== false) await queueIntakeReport({ intakeId: id });
  return result;
}

/** A previewed intake set aside; its file and report stay. */
export async function discardIntake(id: string, byUserId: string): Promise<IntakeOperationResult> {
  const sequelize = db().sequelize;
  return sequelize.transaction(async (transaction): Promise<IntakeOperationResult> => {
    const intake = await selectIntake(id, transaction, true);
    if (!intake) return { ok: false, code: "not-found", message: "No intake has that id." };
    if (intake.state !== "previewed") return wrongState(intake, "discarded");
    await sequelize.query(`UPDATE intakes SET state = 'discarded', discarded_by = $2, discarded_at = clock_timestamp(), updated_at = clock_timestamp() WHERE id = $1`, {
      bind: [id, byUserId],
      transaction,
    });
    return { ok: true, intake: toView((await selectIntake(id, transaction))!) };
  });
}

interface LaterChangeSql {
  file_name: string | null;
  committed_at: Date | null;
  editor_name: string | null;
  created_at: Date;
  manufacturer: string;
  part_number: string;
}

function blockedMessage(later: LaterChangeSql): string {
  const part = `${later.part_number} by ${later.manufacturer}`;
  if (later.file_name !== null) {
    return `A later intake changed ${part}: "${later.file_name}", committed on ${when(later.committed_at)}. Roll that one back first.`;
  }
  return `${part} was corrected by ${later.editor_name ?? "a librarian"} on ${when(later.created_at)}, after this intake; rolling back would overwrite that correction.`;
}

/** The oldest committed intake or edit after this intake that changed these parts (partIds) or their offers (offerPartIds). */
async function findLaterChange(
  intake: IntakeSql,
  partIds: readonly string[],
  offerPartIds: readonly string[],
  transaction: Transaction,
): Promise<LaterChangeSql | null> {
  const sequelize = db().sequelize;
  const [partChange] = partIds.length
    ? await sequelize.query<LaterChangeSql>(
        `SELECT i.file_name, i.committed_at, u.display_name AS editor_name, r.created_at, p.manufacturer, p.part_number
         FROM part_revisions r
         JOIN parts p ON p.id = r.part_id
         LEFT JOIN intakes i ON i.id = r.intake_id
         LEFT JOIN users u ON u.id = r.editor_id
         WHERE r.part_id = ANY($1::uuid[]) AND r.intake_id IS DISTINCT FROM $2
           AND ((r.action = 'edit' AND r.created_at > $3) OR (r.action = 'intake' AND i.state = 'committed' AND i.committed_at > $3))
         ORDER BY coalesce(i.committed_at, r.created_at) LIMIT 1`,
        { bind: [partIds, intake.id, intake.committed_at], type: QueryTypes.SELECT, transaction },
      )
    : [];
  const [offerChange] = offerPartIds.length
    ? await sequelize.query<LaterChangeSql>(
        `SELECT i.file_name, i.committed_at, NULL AS editor_name, o.created_at, p.manufacturer, p.part_number
         FROM offer_revisions o
         JOIN parts p ON p.id = o.part_id
         JOIN intakes i ON i.id = o.intake_id
         WHERE o.part_id = ANY($1::uuid[]) AND o.intake_id <> $2 AND o.action = 'intake' AND i.state = 'committed' AND i.committed_at > $3
         ORDER BY i.committed_at LIMIT 1`,
        { bind: [offerPartIds, intake.id, intake.committed_at], type: QueryTypes.SELECT, transaction },
      )
    : [];
  const candidates = [partChange, offerChange].filter((c): c is LaterChangeSql => Boolean(c));
  candidates.sort((a, b) => new Date(a.committed_at ?? a.created_at).getTime() - new Date(b.committed_at ?? b.created_at).getTime());
  return candidates[0] ?? null;
}

async function rollbackParts(intake: IntakeSql, transaction: Transaction): Promise<IntakeOperationResult | null> {
  const revisions = await db().sequelize.query<{ part_id: string; before: PartSpec | null; after: PartSpec | null }>(
    `SELECT part_id, before, after FROM part_revisions WHERE intake_id = $1 AND action = 'intake' ORDER BY id`,
    { bind: [intake.id], type: QueryTypes.SELECT, transaction },
  );
  const removed = revisions.filter((r) => r.before === null).map((r) => r.part_id);
  // Restoring a part's values leaves its offers alone; only parts this intake created (and now removes) take offers with them.
  const later = await findLaterChange(
    intake,
    revisions.map((r) => r.part_id),
    removed,
    transaction,
  );
  if (later) return { ok: false, code: "blocked", message: blockedMessage(later) };
  const restored = revisions.filter((r): r is typeof r & { before: PartSpec } => r.before !== null);
  await deleteParts(removed, transaction);
  await updateParts(
    restored.map((r) => ({ id: r.part_id, spec: r.before })),
    transaction,
  );
  await insertPartRevisions(
    restored.map((r) => ({ partId: r.part_id, action: "rollback", intakeId: intake.id, editorId: null, before: r.after, after: r.before })),
    transaction,
  );
  return null;
}

async function rollbackOffers(intake: IntakeSql, transaction: Transaction): Promise<IntakeOperationResult | null> {
  const revisions = await db().sequelize.query<{ part_id: string; supplier: string; before: Offer | null; after: Offer | null }>(
    `SELECT part_id, supplier, before, after FROM offer_revisions WHERE intake_id = $1 AND action = 'intake' ORDER BY id`,
    { bind: [intake.id], type: QueryTypes.SELECT, transaction },
  );
  const later = await findLaterChange(
    intake,
    [],
    revisions.map((r) => r.part_id),
    transaction,
  );
  if (later) return { ok: false, code: "blocked", message: blockedMessage(later) };
  const removed = revisions.filter((r) => r.before === null);
  if (removed.length > 0) {
    await db().sequelize.query(
      `DELETE FROM offers o USING unnest($1::uuid[], $2::text[]) AS d(part_id, supplier_key) WHERE o.part_id = d.part_id AND o.supplier_key = d.supplier_key`,
      { bind: [removed.map((r) => r.part_id), removed.map((r) => identityKey(r.supplier))], transaction },
    );
  }
  const restored = revisions.filter((r): r is typeof r & { before: Offer } => r.before !== null);
  await upsertOffers(
    restored.map((r) => ({ partId: r.part_id, offer: r.before, intakeId: null })),
    transaction,
  );
  await insertOfferRevisions(
    revisions.map((r) => ({ partId: r.part_id, supplier: r.supplier, action: "rollback", intakeId: intake.id, before: r.after, after: r.before })),
    transaction,
  );
  return null;
}

/**
 * Restores every part (or offer) a committed intake touched to what it was before, in one transaction.
 * Refused while a later committed intake or an edit changed the same parts.
 */
export async function rollbackIntake(id: string, byUserId: string): Promise<IntakeOperationResult> {
  const sequelize = db().sequelize;
  return sequelize.transaction(async (transaction): Promise<IntakeOperationResult> => {
    await lockCatalogue(transaction);
    const intake = await selectIntake(id, transaction, true);
    if (!intake) return { ok: false, code: "not-found", message: "No intake has that id." };
    if (intake.state !== "committed") return wrongState(intake, "rolled back");
    const refused = intake.kind === "parts" ? await rollbackParts(intake, transaction) : await rollbackOffers(intake, transaction);
    if (refused) return refused;
    await sequelize.query(
      `UPDATE intakes SET state = 'rolled-back', rolled_back_by = $2, rolled_back_at = clock_timestamp(), updated_at = clock_timestamp() WHERE id = $1`,
      { bind: [id, byUserId], transaction },
    );
    await bumpCatalogueVersion(transaction);
    return { ok: true, intake: toView((await selectIntake(id, transaction))!) };
  });
}
