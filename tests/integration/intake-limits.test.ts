// Size limits: a file over 20 MB gets a clear 413 and nothing stored; a 100k-row file goes all the way through.
import type { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { MAX_INTAKE_BYTES } from "#app/domain/intake/columns.ts";
import { connect } from "../setup/databases.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { fingerprintCatalogue, generateCompactPartsCsv, LIBRARIAN, operate, uploadIntake } from "../setup/intake-helpers.ts";

let agent: Agent;
let sequelize: Sequelize;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
  sequelize = connect(inject("databaseUrl"));
});

afterAll(async () => {
  await sequelize.close();
});

const countIntakes = async () => Number(((await sequelize.query(`SELECT count(*) AS n FROM intakes`))[0][0] as { n: string }).n);

describe("intake size limits", () => {
  it("answers 413 with a clear message for a file over 20 MB, storing nothing", async () => {
    const intakesBefore = await countIntakes();
    const before = await fingerprintCatalogue(sequelize);
    const line = "Oversize Devices,OVS-1,NPN,TO-92,45,0.1,2mA,110\r\n";
    const big = Buffer.from("manufacturer,part_number,polarity,package,vceo,ic_max,gain1_ic,gain1_hfe_min\r\n" + line.repeat(Math.ceil((MAX_INTAKE_BYTES + 1024) / line.length)));
    expect(big.length).toBeGreaterThan(MAX_INTAKE_BYTES);
    const response = await uploadIntake(agent, "parts", "oversize.csv", big);
    expect(response.status).toBe(413);
    expect(response.body.error).toEqual({
      code: "too-large",
      message: "The file is larger than the 20 MB an intake accepts. Split it into smaller files.",
      details: { maxBytes: MAX_INTAKE_BYTES },
    });
    expect(await countIntakes()).toBe(intakesBefore);
    expect(await fingerprintCatalogue(sequelize)).toEqual(before);
  });

  it("takes a generated 100k-row parts file through preview, commit and rollback", { timeout: 600_000 }, async () => {
    const maker = "Bulkwell Test Devices";
    const csv = Buffer.from(generateCompactPartsCsv(100_000, maker, "BKW"));
    expect(csv.length).toBeLessThan(MAX_INTAKE_BYTES);
    const preview = await uploadIntake(agent, "parts", "bulkwell-100k.csv", csv);
    expect(preview.status).toBe(201);
    expect(preview.body).toMatchObject({ counts: { new: 100_000, changed: 0, rejected: 0 }, problems: [], changesTotal: 100_000, canCommit: true });
    expect(preview.body.changes).toHaveLength(2000);

    const commit = await operate(agent, preview.body.id, "commit");
    expect(commit.status).toBe(200);
    const [counted] = await sequelize.query(
      `SELECT count(*)::int AS parts, (SELECT count(*)::int FROM part_revisions WHERE intake_id = $1) AS revisions FROM parts WHERE manufacturer = $2`,
      { bind: [preview.body.id, maker] },
    );
    expect(counted[0]).toEqual({ parts: 100_000, revisions: 100_000 });
    const listed = await agent.get("/api/parts").query({ q: "BKW-0999", size: 10 });
    expect(listed.body.total).toBe(100);

    expect((await operate(agent, preview.body.id, "rollback")).status).toBe(200);
    const [left] = await sequelize.query(`SELECT count(*)::int AS parts FROM parts WHERE manufacturer = $1`, { bind: [maker] });
    expect(left[0]).toEqual({ parts: 0 });
    // Settle the 200k dead rows now, so no autovacuum worker is still busy in this database when the run drops it.
    await sequelize.query(`VACUUM (ANALYZE) parts, part_revisions, intakes`);
  });
});
