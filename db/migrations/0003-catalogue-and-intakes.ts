import type { QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Catalogue parts, offers, intakes and revisions (issue 4). Electrical values are SI base units in
// double precision: they arrive as JavaScript doubles from the quantity parser and are kept bit for bit.
const UP = [
  // One row, bumped by every commit, rollback and edit, so caches on every app instance see a change at once.
  `CREATE TABLE catalogue_version (
     id smallint PRIMARY KEY DEFAULT 1 CHECK (id = 1),
     version bigint NOT NULL DEFAULT 0,
     changed_at timestamptz NOT NULL DEFAULT now()
   )`,
  `INSERT INTO catalogue_version (id, version) VALUES (1, 0)`,
  `CREATE TABLE parts (
     id uuid PRIMARY KEY,
     manufacturer text NOT NULL CHECK (length(trim(manufacturer)) > 0),
     part_number text NOT NULL CHECK (length(trim(part_number)) > 0),
     polarity text NOT NULL CHECK (polarity IN ('npn', 'pnp')),
     package_name text NOT NULL,
     configuration text NOT NULL CHECK (configuration IN ('single', 'darlington', 'dual')),
     vceo_volts double precision NOT NULL,
     vcbo_volts double precision,
     vebo_volts double precision,
     ic_max_amps double precision NOT NULL,
     ptot_watts double precision,
     ptot_reference text CHECK (ptot_reference IN ('ambient', 'case')),
     tj_max_c double precision,
     rth_ja_c_per_w double precision,
     rth_jc_c_per_w double precision,
     -- JSONB, sorted by IC: points are always read and written with their part, and the hFE filter
     -- interpolates them in the app over the catalogue cache keyed on catalogue_version.
     gain_points jsonb NOT NULL DEFAULT '[]',
     saturation_points jsonb NOT NULL DEFAULT '[]',
     vbe_on_volts double precision,
     ft_hz double precision,
     cob_farads double precision,
     early_volts double precision,
     lifecycle text NOT NULL CHECK (lifecycle IN ('active', 'nrnd', 'last-time-buy', 'obsolete')),
     datasheet_url text,
     datasheet_revision_date date,
     created_at timestamptz NOT NULL DEFAULT now(),
     updated_at timestamptz NOT NULL DEFAULT now()
   )`,
  // A part is manufacturer + part number, trimmed and case-insensitive.
  `CREATE UNIQUE INDEX parts_identity ON parts (lower(trim(manufacturer)), lower(trim(part_number)))`,
  `CREATE TABLE intakes (
     id uuid PRIMARY KEY,
     kind text NOT NULL CHECK (kind IN ('parts', 'offers')),
     file_name text NOT NULL,
     size_bytes integer NOT NULL,
     file_bytes bytea NOT NULL,
     uploaded_by uuid NOT NULL REFERENCES users (id),
     state text NOT NULL CHECK (state IN ('previewed', 'committed', 'discarded', 'rolled-back')),
     file_refused boolean NOT NULL DEFAULT false,
     new_count integer NOT NULL DEFAULT 0,
     changed_count integer NOT NULL DEFAULT 0,
     unchanged_count integer NOT NULL DEFAULT 0,
     rejected_count integer NOT NULL DEFAULT 0,
     warning_count integer NOT NULL DEFAULT 0,
     problem_count integer NOT NULL DEFAULT 0,
     -- The accepted rows as parsed and compared at preview, so commit never parses the file again: one array of
     -- [row, status, value, changes], part values in a positional form (a third of the size). json, not jsonb:
     -- it is only ever read whole, and json skips the conversion to and from the binary form (a 100k-row file is 20 MB).
     parsed_rows json NOT NULL DEFAULT '[]',
     -- The catalogue version the preview compared against: unchanged at commit means the comparison still holds.
     compared_at_version bigint NOT NULL DEFAULT 0,
     committed_by uuid REFERENCES users (id),
     committed_at timestamptz,
     discarded_by uuid REFERENCES users (id),
     discarded_at timestamptz,
     rolled_back_by uuid REFERENCES users (id),
     rolled_back_at timestamptz,
     created_at timestamptz NOT NULL DEFAULT now(),
     updated_at timestamptz NOT NULL DEFAULT now()
   )`,
  // The stored file is read whole or not at all; skipping compression keeps large uploads fast.
  `ALTER TABLE intakes ALTER COLUMN file_bytes SET STORAGE EXTERNAL`,
  `ALTER TABLE intakes ALTER COLUMN parsed_rows SET STORAGE EXTERNAL`,
  `CREATE INDEX intakes_created_at ON intakes (created_at)`,
  `CREATE TABLE intake_problems (
     intake_id uuid NOT NULL REFERENCES intakes (id) ON DELETE CASCADE,
     position integer NOT NULL,
     row_number integer,
     column_name text,
     value text,
     message text NOT NULL,
     severity text NOT NULL CHECK (severity IN ('error', 'warning')),
     PRIMARY KEY (intake_id, position)
   )`,
  `CREATE TABLE offers (
     id uuid PRIMARY KEY,
     part_id uuid NOT NULL REFERENCES parts (id) ON DELETE CASCADE,
     supplier text NOT NULL,
     supplier_sku text,
     stock integer NOT NULL CHECK (stock >= 0),
     minimum_order integer NOT NULL CHECK (minimum_order >= 1),
     order_multiple integer NOT NULL CHECK (order_multiple >= 1),
     -- JSONB list of {quantity, unitPrice}, ascending: breaks are always read and priced with their offer.
     price_breaks jsonb NOT NULL,
     currency text NOT NULL,
     lead_time_days integer,
     as_of date NOT NULL,
     intake_id uuid REFERENCES intakes (id) ON DELETE SET NULL,
     created_at timestamptz NOT NULL DEFAULT now(),
     updated_at timestamptz NOT NULL DEFAULT now()
   )`,
  // One offer per part and supplier.
  `CREATE UNIQUE INDEX offers_part_supplier ON offers (part_id, lower(trim(supplier)))`,
  `CREATE TABLE part_revisions (
     id bigserial PRIMARY KEY,
     part_id uuid NOT NULL REFERENCES parts (id) ON DELETE CASCADE,
     action text NOT NULL CHECK (action IN ('intake', 'rollback', 'edit')),
     intake_id uuid REFERENCES intakes (id) ON DELETE CASCADE,
     editor_id uuid REFERENCES users (id),
     before jsonb,
     after jsonb,
     -- clock_timestamp, not now(): writers wait for the catalogue lock, and history is ordered by when they wrote.
     created_at timestamptz NOT NULL DEFAULT clock_timestamp(),
     CHECK ((action = 'edit') = (intake_id IS NULL))
   )`,
  `CREATE INDEX part_revisions_part ON part_revisions (part_id, id)`,
  `CREATE INDEX part_revisions_intake ON part_revisions (intake_id)`,
  // The offers an offers intake wrote and what they replaced, so a rollback can put them back.
  `CREATE TABLE offer_revisions (
     id bigserial PRIMARY KEY,
     part_id uuid NOT NULL REFERENCES parts (id) ON DELETE CASCADE,
     supplier text NOT NULL,
     action text NOT NULL CHECK (action IN ('intake', 'rollback')),
     intake_id uuid NOT NULL REFERENCES intakes (id) ON DELETE CASCADE,
     before jsonb,
     after jsonb,
     created_at timestamptz NOT NULL DEFAULT clock_timestamp()
   )`,
  `CREATE INDEX offer_revisions_part ON offer_revisions (part_id, id)`,
  `CREATE INDEX offer_revisions_intake ON offer_revisions (intake_id)`,
];

const DOWN = [
  "DROP TABLE IF EXISTS offer_revisions",
  "DROP TABLE IF EXISTS part_revisions",
  "DROP TABLE IF EXISTS offers",
  "DROP TABLE IF EXISTS intake_problems",
  "DROP TABLE IF EXISTS intakes",
  "DROP TABLE IF EXISTS parts",
  "DROP TABLE IF EXISTS catalogue_version",
];

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    for (const sql of UP) await qi.sequelize.query(sql, { transaction });
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    for (const sql of DOWN) await qi.sequelize.query(sql, { transaction });
  });
};
