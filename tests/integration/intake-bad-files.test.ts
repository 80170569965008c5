// Every bad fixture through POST /api/intakes: the exact problems and readings, and not one row written anywhere.
import type { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { BAD_FIXTURE_EXPECTATIONS } from "#fixtures/intake/expectations.ts";
import { listIntakeFixtures, readIntakeFixture } from "#fixtures/intake/read-fixtures.ts";
import { connect } from "../setup/databases.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { fingerprintCatalogue, LIBRARIAN, operate, uploadIntake } from "../setup/intake-helpers.ts";
import { commitBadFixture } from "./support/intake-fixtures.ts";

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

// Offer rows the parser accepts still need their part in the catalogue; the fixtures name parts the demo does not have.
function catalogueProblems(name: string) {
  if (name !== "offers-duplicate-offer.csv") return [];
  return [
    {
      row: 2,
      column: "part_number",
      severity: "error",
      message: 'no part "LS-N100" by "Larkfield Semiconductor" in the catalogue: import the part with a parts file first',
    },
  ];
}

describe("bad intake files over HTTP", () => {
  it.each(listIntakeFixtures("bad"))("%s: exact problems, nothing written", async (name) => {
    const expected = BAD_FIXTURE_EXPECTATIONS[name]!;
    // An offers file names parts: those come from the parts fixture it requires, committed first.
    if (expected.requires) await commitBadFixture(agent, expected.requires);
    const before = await fingerprintCatalogue(sequelize);
    const response = await uploadIntake(agent, expected.kind, name, readIntakeFixture("bad", name));
    expect(response.status).toBe(201);
    const problems = response.body.problems.map(({ row, column, severity, message }: Record<string, unknown>) => ({ row, column, severity, message }));
    expect(problems).toEqual([...expected.problems, ...catalogueProblems(name)]);
    expect(response.body.problemsTotal).toBe(problems.length);
    expect(response.body.counts.warnings).toBe(expected.problems.filter((p) => p.severity === "warning").length);
    expect(response.body.readings).toEqual(expected.readings ?? []);

    if (response.body.changesTotal === 0) {
      // Every row rejected (or the file refused): committing is refused and writes nothing.
      expect(response.body.canCommit).toBe(false);
      const commit = await operate(agent, response.body.id, "commit");
      expect(commit.status).toBe(409);
      expect(commit.body.error.code).toBe("wrong-state");
      expect(commit.body.error.message).toMatch(/could not be read|Nothing to commit/);
    } else {
      expect(response.body.changesTotal).toBe(expected.acceptedRows);
    }
    expect(await fingerprintCatalogue(sequelize)).toEqual(before);
    const [stored] = await sequelize.query(`SELECT state, size_bytes FROM intakes WHERE id = $1`, { bind: [response.body.id] });
    expect(stored[0]).toEqual({ state: "previewed", size_bytes: readIntakeFixture("bad", name).byteLength });
  });
});
