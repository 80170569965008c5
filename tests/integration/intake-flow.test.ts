// The intake flow over HTTP against the built server, with direct SQL reads to prove what was written.
import type { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { connect } from "../setup/databases.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import {
  commitParts,
  fingerprintCatalogue,
  LIBRARIAN,
  makeOffer,
  makeSpec,
  offersFile,
  operate,
  partsFile,
  uploadIntake,
  waitForIntakeReport,
} from "../setup/intake-helpers.ts";

let agent: Agent;
let sequelize: Sequelize;

async function partRow(manufacturer: string, partNumber: string) {
  const [rows] = await sequelize.query(`SELECT id, vceo_volts, ptot_watts, lifecycle FROM parts WHERE manufacturer = $1 AND part_number = $2`, {
    bind: [manufacturer, partNumber],
  });
  return rows[0] as { id: string; vceo_volts: number; ptot_watts: number; lifecycle: string } | undefined;
}

async function revisionsOf(partId: string) {
  const [rows] = await sequelize.query(`SELECT action, intake_id, before, after FROM part_revisions WHERE part_id = $1 ORDER BY id`, { bind: [partId] });
  return rows as Array<{ action: string; intake_id: string; before: Record<string, unknown> | null; after: Record<string, unknown> | null }>;
}

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
  sequelize = connect(inject("databaseUrl"));
});

afterAll(async () => {
  await sequelize.close();
});

describe("intake preview", () => {
  it("stores the file byte for byte and its parse, and leaves the catalogue alone", async () => {
    const maker = "Previewmoor Devices";
    const before = await fingerprintCatalogue(sequelize);
    const bytes = partsFile([makeSpec(maker, "PVM-1"), makeSpec(maker, "PVM-2", { polarity: "pnp" })]);
    const response = await uploadIntake(agent, "parts", "previewmoor.csv", bytes);
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({
      kind: "parts",
      fileName: "previewmoor.csv",
      sizeBytes: bytes.length,
      state: "previewed",
      uploadedBy: { name: "Lena Marsh" },
      counts: { new: 2, changed: 0, unchanged: 0, rejected: 0, warnings: 0 },
      canCommit: true,
      problems: [],
      changesTotal: 2,
    });
    expect(response.body.changes.map((c: { row: number; status: string; partNumber: string }) => [c.row, c.status, c.partNumber])).toEqual([
      [2, "new", "PVM-1"],
      [3, "new", "PVM-2"],
    ]);
    expect(await fingerprintCatalogue(sequelize)).toEqual(before);
    const [stored] = await sequelize.query(`SELECT file_bytes FROM intakes WHERE id = $1`, { bind: [response.body.id] });
    expect(Buffer.compare((stored[0] as { file_bytes: Buffer }).file_bytes, bytes)).toBe(0);
    const download = await agent.get(`/intakes/${response.body.id}/file`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => done(null, Buffer.concat(chunks)));
    });
    expect(download.status).toBe(200);
    expect(download.headers["content-disposition"]).toContain('filename="previewmoor.csv"');
    expect(Buffer.compare(download.body as Buffer, bytes)).toBe(0);
    const listed = await agent.get("/api/intakes");
    expect(listed.status).toBe(200);
    expect(listed.body.intakes[0]).toMatchObject({ id: response.body.id, state: "previewed" });
  });

  it("answers 400 without kind or file, naming the missing field", async () => {
    const noFile = await agent.post("/api/intakes").field("kind", "parts");
    expect(noFile.status).toBe(400);
    expect(noFile.body.error.details).toEqual({ file: "file is required: attach the CSV file" });
    const badKind = await agent.post("/api/intakes").field("kind", "widgets").attach("file", partsFile([]), "x.csv");
    expect(badKind.status).toBe(400);
    expect(badKind.body.error.details).toEqual({ kind: "kind must be parts or offers" });
  });

  it("serves both templates as CSV downloads", async () => {
    for (const kind of ["parts", "offers"]) {
      const response = await agent.get(`/intakes/templates/${kind}`);
      expect(response.status).toBe(200);
      expect(response.headers["content-type"]).toMatch(/^text\/csv/);
      expect(response.headers["content-disposition"]).toBe(`attachment; filename="betasift-${kind}-template.csv"`);
      expect(response.text.split("\r\n")[0]).toContain("manufacturer,part_number");
    }
    expect((await agent.get("/intakes/templates/widgets")).status).toBe(404);
  });
});

describe("intake commit, discard and rollback", () => {
  it("commits in one go: parts, one revision each, a new catalogue version, and a report e-mail", async () => {
    const maker = "Commitfield Semis";
    const [versionBefore] = await sequelize.query(`SELECT version FROM catalogue_version`);
    const preview = await uploadIntake(agent, "parts", "commitfield.csv", partsFile([makeSpec(maker, "CMF-1"), makeSpec(maker, "CMF-2")]));
    const since = Date.now();
    const commit = await operate(agent, preview.body.id, "commit");
    expect(commit.status).toBe(200);
    expect(commit.body).toMatchObject({ id: preview.body.id, state: "committed", canCommit: false, counts: { new: 2 } });
    expect(commit.body.committedAt).toEqual(expect.any(String));
    const part = await partRow(maker, "CMF-1");
    expect(part).toMatchObject({ vceo_volts: 45, ptot_watts: 0.5, lifecycle: "active" });
    const revisions = await revisionsOf(part!.id);
    expect(revisions).toHaveLength(1);
    expect(revisions[0]).toMatchObject({ action: "intake", intake_id: preview.body.id, before: null, after: { partNumber: "CMF-1", vceoVolts: 45 } });
    const [versionAfter] = await sequelize.query(`SELECT version FROM catalogue_version`);
    expect(Number((versionAfter[0] as { version: string }).version)).toBe(Number((versionBefore[0] as { version: string }).version) + 1);

    const mail = await waitForIntakeReport(inject("mailDir"), "commitfield.csv", since);
    expect(mail.text).toContain("new: 2");
    expect(mail.text).toContain(`/intakes/${preview.body.id}`);

    const again = await operate(agent, preview.body.id, "commit");
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: "wrong-state", message: expect.stringContaining('"commitfield.csv" was already committed on') });
    expect((await operate(agent, preview.body.id, "discard")).status).toBe(409);
  });

  it("discards a preview, keeping the file and its report, and refuses to commit it afterwards", async () => {
    const maker = "Discardley Parts";
    const preview = await uploadIntake(agent, "parts", "discardley.csv", partsFile([makeSpec(maker, "DSC-1")]));
    const discard = await operate(agent, preview.body.id, "discard");
    expect(discard.status).toBe(200);
    expect(discard.body).toMatchObject({ state: "discarded", canCommit: false, discardedAt: expect.any(String) });
    expect(await partRow(maker, "DSC-1")).toBeUndefined();
    const detail = await agent.get(`/api/intakes/${preview.body.id}`);
    expect(detail.body).toMatchObject({ state: "discarded", changesTotal: 1 });
    expect((await agent.get(`/intakes/${preview.body.id}/file`)).status).toBe(200);
    const commit = await operate(agent, preview.body.id, "commit");
    expect(commit.status).toBe(409);
    expect(commit.body.error.message).toContain("was discarded on");
    expect((await operate(agent, preview.body.id, "rollback")).status).toBe(409);
  });

  it("shows a change to an existing part before and after, and rollback restores it and removes created parts", async () => {
    const maker = "Rollwick Devices";
    await commitParts(agent, "rollwick-1.csv", [makeSpec(maker, "RWK-1")]);
    const original = await partRow(maker, "RWK-1");
    const preview = await uploadIntake(
      agent,
      "parts",
      "rollwick-2.csv",
      partsFile([makeSpec(maker, "RWK-1", { vceoVolts: 60, lifecycle: "nrnd" }), makeSpec(maker, "RWK-2")]),
    );
    expect(preview.body.counts).toMatchObject({ new: 1, changed: 1, unchanged: 0 });
    const changed = preview.body.changes.find((c: { partNumber: string }) => c.partNumber === "RWK-1");
    expect(changed).toMatchObject({ status: "changed" });
    expect(changed.fields).toEqual([
      { field: "vceoVolts", before: 45, after: 60 },
      { field: "lifecycle", before: "active", after: "nrnd" },
    ]);
    expect((await operate(agent, preview.body.id, "commit")).status).toBe(200);
    expect(await partRow(maker, "RWK-1")).toMatchObject({ vceo_volts: 60, lifecycle: "nrnd" });

    const rollback = await operate(agent, preview.body.id, "rollback");
    expect(rollback.status).toBe(200);
    expect(rollback.body).toMatchObject({ state: "rolled-back", rolledBackAt: expect.any(String) });
    expect(await partRow(maker, "RWK-1")).toEqual(original);
    expect(await partRow(maker, "RWK-2")).toBeUndefined();
    const revisions = await revisionsOf(original!.id);
    expect(revisions.map((r) => r.action)).toEqual(["intake", "intake", "rollback"]);
    expect(revisions[2]).toMatchObject({ before: { vceoVolts: 60 }, after: { vceoVolts: 45, lifecycle: "active" } });
    expect((await operate(agent, preview.body.id, "rollback")).body.error.message).toContain("was already rolled back on");
  });

  it("refuses a rollback while a later intake changed the same parts, naming it, and allows it once that one is rolled back", async () => {
    const maker = "Blockham Semis";
    const first = await commitParts(agent, "blockham-first.csv", [makeSpec(maker, "BLK-1"), makeSpec(maker, "BLK-2")]);
    const second = await commitParts(agent, "blockham-second.csv", [makeSpec(maker, "BLK-2", { vceoVolts: 80 })]);
    const before = await fingerprintCatalogue(sequelize);
    const refused = await operate(agent, first, "rollback");
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe("blocked");
    expect(refused.body.error.message).toMatch(/^A later intake changed BLK-2 by Blockham Semis: "blockham-second\.csv", committed on \d{4}-\d\d-\d\d \d\d:\d\d UTC\. Roll that one back first\.$/);
    expect(await fingerprintCatalogue(sequelize)).toEqual(before);

    expect((await operate(agent, second, "rollback")).status).toBe(200);
    expect(await partRow(maker, "BLK-2")).toMatchObject({ vceo_volts: 45 });
    expect((await operate(agent, first, "rollback")).status).toBe(200);
    expect(await partRow(maker, "BLK-1")).toBeUndefined();
    expect(await partRow(maker, "BLK-2")).toBeUndefined();
  });

  it("answers 404 for an unknown intake or operation", async () => {
    const unknown = await operate(agent, "00000000-0000-4000-8000-000000000000", "commit");
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe("not-found");
    const [[row]] = (await sequelize.query(`SELECT id FROM intakes ORDER BY created_at LIMIT 1`)) as [Array<{ id: string }>, unknown];
    const operation = await operate(agent, row.id, "publish");
    expect(operation.status).toBe(404);
    expect(operation.body.error.message).toBe('No operation "publish" on an intake: use commit, discard or rollback.');
    expect((await agent.get("/api/intakes/not-a-uuid")).status).toBe(404);
    expect((await agent.get("/api/intakes/00000000-0000-4000-8000-000000000000")).status).toBe(404);
  });
});

describe("offers intake", () => {
  it("keeps one offer per part and supplier, replacing it on a later intake, and rollback restores the replaced offer", async () => {
    const maker = "Offerton Devices";
    await commitParts(agent, "offerton-parts.csv", [makeSpec(maker, "OFT-1")]);
    const part = await partRow(maker, "OFT-1");
    const first = await uploadIntake(agent, "offers", "offerton-offers-1.csv", offersFile([{ manufacturer: maker, partNumber: "OFT-1", offer: makeOffer("Quayside Stock", { stock: 500 }) }]));
    expect(first.body.counts).toMatchObject({ new: 1 });
    expect((await operate(agent, first.body.id, "commit")).status).toBe(200);

    const second = await uploadIntake(
      agent,
      "offers",
      "offerton-offers-2.csv",
      offersFile([
        { manufacturer: maker.toUpperCase(), partNumber: " oft-1 ", offer: makeOffer("quayside stock", { stock: 20 }) },
        { manufacturer: maker, partNumber: "OFT-404", offer: makeOffer("Quayside Stock") },
      ]),
    );
    expect(second.body.counts).toMatchObject({ new: 0, changed: 1, rejected: 1 });
    expect(second.body.problems).toEqual([
      {
        row: 3,
        column: "part_number",
        value: "OFT-404",
        severity: "error",
        message: 'no part "OFT-404" by "Offerton Devices" in the catalogue: import the part with a parts file first',
      },
    ]);
    expect(second.body.changes[0].fields).toEqual(expect.arrayContaining([{ field: "stock", before: 500, after: 20 }]));
    expect((await operate(agent, second.body.id, "commit")).status).toBe(200);
    const offers = async () => (await sequelize.query(`SELECT supplier, stock FROM offers WHERE part_id = $1`, { bind: [part!.id] }))[0];
    expect(await offers()).toEqual([{ supplier: "quayside stock", stock: 20 }]);

    const detail = await agent.get(`/api/parts/${part!.id}`);
    expect(detail.body.offers).toEqual([expect.objectContaining({ supplier: "quayside stock", stock: 20, priceBreaks: [{ quantity: 1, unitPrice: 0.2 }, { quantity: 100, unitPrice: 0.12 }] })]);

    const refused = await operate(agent, first.body.id, "rollback");
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain('"offerton-offers-2.csv"');
    expect((await operate(agent, second.body.id, "rollback")).status).toBe(200);
    expect(await offers()).toEqual([{ supplier: "Quayside Stock", stock: 500 }]);
    expect((await operate(agent, first.body.id, "rollback")).status).toBe(200);
    expect(await offers()).toEqual([]);
  });
});
