// Helpers for the intake and catalogue tests and benches: invented parts, uploads, table fingerprints.
import type { Sequelize } from "sequelize";
import { writeOffersCsv, writePartsCsv } from "#app/domain/intake/write-csv.ts";
import type { Offer, PartSpec } from "#app/domain/part.ts";
import type { Agent } from "./http.ts";
import { readMails, type CaughtMail } from "./mail-catcher.ts";

export const LIBRARIAN = "librarian@larkfield.example.com";

/** A complete invented part; every test passes its own manufacturer so tests never touch each other's parts. */
export function makeSpec(manufacturer: string, partNumber: string, overrides: Partial<PartSpec> = {}): PartSpec {
  return {
    manufacturer,
    partNumber,
    polarity: "npn",
    packageName: "TO-92",
    configuration: "single",
    vceoVolts: 45,
    vcboVolts: 50,
    veboVolts: 6,
    icMaxAmps: 0.1,
    ptotWatts: 0.5,
    ptotReference: "ambient",
    tjMaxC: 150,
    rthJaCPerW: 250,
    rthJcCPerW: null,
    gainPoints: [
      { icAmps: 0.002, vceVolts: 5, hfeMin: 110, hfeTyp: 250, hfeMax: 450, tempC: 25 },
      { icAmps: 0.05, vceVolts: 5, hfeMin: 60, hfeTyp: 120, hfeMax: null, tempC: 25 },
    ],
    saturationPoints: [{ icAmps: 0.01, ibAmps: 0.001, vceSatMaxVolts: 0.25, vceSatTypVolts: null, vbeSatVolts: null }],
    vbeOnVolts: 0.65,
    ftHz: 2.5e8,
    cobFarads: 4e-12,
    earlyVolts: 100,
    lifecycle: "active",
    datasheetUrl: null,
    datasheetRevisionDate: "2024-03-15",
    ...overrides,
  };
}

export function makeOffer(supplier: string, overrides: Partial<Offer> = {}): Offer {
  return {
    supplier,
    supplierSku: null,
    stock: 1000,
    minimumOrder: 1,
    orderMultiple: 1,
    priceBreaks: [
      { quantity: 1, unitPrice: 0.2 },
      { quantity: 100, unitPrice: 0.12 },
    ],
    currency: "EUR",
    leadTimeDays: null,
    asOf: "2026-11-30",
    ...overrides,
  };
}

export const partsFile = (parts: PartSpec[]) => Buffer.from(writePartsCsv(parts), "utf8");
export const offersFile = (rows: Array<{ manufacturer: string; partNumber: string; offer: Offer }>) => Buffer.from(writeOffersCsv(rows), "utf8");

/** POST /api/intakes as a browser's form would send it. */
export function uploadIntake(agent: Agent, kind: "parts" | "offers", fileName: string, bytes: Buffer | Uint8Array) {
  return agent.post("/api/intakes").field("kind", kind).attach("file", Buffer.from(bytes), { filename: fileName, contentType: "text/csv" });
}

export function operate(agent: Agent, intakeId: string, operation: string) {
  return agent.post(`/api/intakes/${intakeId}/${operation}`);
}

/** Uploads and commits a parts file, failing loudly if either step does not succeed. */
export async function commitParts(agent: Agent, fileName: string, parts: PartSpec[]): Promise<string> {
  const preview = await uploadIntake(agent, "parts", fileName, partsFile(parts));
  if (preview.status !== 201) throw new Error(`preview of ${fileName} answered ${preview.status}: ${preview.text}`);
  const commit = await operate(agent, preview.body.id, "commit");
  if (commit.status !== 200) throw new Error(`commit of ${fileName} answered ${commit.status}: ${commit.text}`);
  return preview.body.id as string;
}

/**
 * A parts file of `count` rows in few columns (about 100 bytes a row, so 100k rows stay under the 20 MB limit),
 * every value varying with the row so that nothing repeats.
 */
export function generateCompactPartsCsv(count: number, manufacturer: string, prefix: string): string {
  const header = "manufacturer,part_number,polarity,package,vceo,ic_max,ptot,ptot_ref,gain1_ic,gain1_vce,gain1_hfe_min,gain1_hfe_max,gain2_ic,gain2_hfe_min,sat1_ic,sat1_ib,sat1_vce_max";
  const packages = ["TO-92", "SOT-23", "TO-220", "SOT-89"];
  const lines = [header];
  for (let i = 0; i < count; i += 1) {
    const npn = i % 2 === 0;
    const vceo = 20 + (i % 180);
    const icMax = Number((0.1 + (i % 50) * 0.05).toFixed(2));
    const hfeMin = 40 + (i % 300);
    lines.push(
      [
        manufacturer,
        `${prefix}-${String(i).padStart(6, "0")}${npn ? "N" : "P"}`,
        npn ? "NPN" : "PNP",
        packages[i % packages.length],
        vceo,
        icMax,
        Number((0.25 + (i % 40) * 0.1).toFixed(2)),
        "ambient",
        "2mA",
        5,
        hfeMin,
        hfeMin * 3,
        "50mA",
        Math.round(hfeMin * 0.6),
        "10mA",
        "1mA",
        "0.25",
      ].join(","),
    );
  }
  return `${lines.join("\r\n")}\r\n`;
}

export interface TableFingerprint {
  table: string;
  rows: number;
  checksum: string | null;
}

/** Row count and a checksum of every row, per catalogue table, to prove what was or was not written. */
export async function fingerprintCatalogue(sequelize: Sequelize): Promise<TableFingerprint[]> {
  const tables = ["parts", "offers", "part_revisions", "offer_revisions", "catalogue_version"];
  const prints: TableFingerprint[] = [];
  for (const table of tables) {
    const [rows] = await sequelize.query(`SELECT count(*)::int AS rows, md5(string_agg(t::text, '|' ORDER BY t::text)) AS checksum FROM ${table} t`);
    const row = rows[0] as { rows: number; checksum: string | null };
    prints.push({ table, rows: row.rows, checksum: row.checksum });
  }
  return prints;
}

/** Waits for the intake report e-mail about one file that arrived after `since`. */
export async function waitForIntakeReport(mailDir: string, fileName: string, since: number, timeoutMs = 30_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = readMails(mailDir).find((m) => m.receivedAt >= since && m.to.includes(LIBRARIAN) && m.subject === `Betasift intake committed: ${fileName}`);
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
  throw new Error(`no intake report for ${fileName} within ${timeoutMs} ms`);
}
