// Two intakes touching the same part, committed at the same moment: one waits for the other, never a mixed state,
// and the second is refused rather than committing a change set its preview did not show (issue item 16).
import type { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { connect } from "../setup/databases.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { commitParts, LIBRARIAN, makeSpec, operate, partsFile, uploadIntake } from "../setup/intake-helpers.ts";

let first: Agent;
let second: Agent;
let sequelize: Sequelize;

beforeAll(async () => {
  first = newAgent();
  second = newAgent();
  await signIn(first, LIBRARIAN);
  await signIn(second, LIBRARIAN);
  sequelize = connect(inject("databaseUrl"));
});

afterAll(async () => {
  await sequelize.close();
});

describe("concurrent commits", () => {
  it("serialises two intakes that change the same parts: the first commits, the second is refused until previewed again", async () => {
    const maker = "Racewell Semis";
    const base = [makeSpec(maker, "RCW-1"), makeSpec(maker, "RCW-2")];
    await commitParts(first, "racewell-base.csv", base);
    const fileA = base.map((p) => ({ ...p, vceoVolts: 50, ptotWatts: 0.6, lifecycle: "nrnd" as const }));
    const fileB = base.map((p) => ({ ...p, vceoVolts: 70, ptotWatts: 0.8, lifecycle: "obsolete" as const }));
    const a = await uploadIntake(first, "parts", "racewell-a.csv", partsFile(fileA));
    const b = await uploadIntake(second, "parts", "racewell-b.csv", partsFile(fileB));
    expect([a.body.counts.changed, b.body.counts.changed]).toEqual([2, 2]);

    const [commitA, commitB] = await Promise.all([operate(first, a.body.id, "commit"), operate(second, b.body.id, "commit")]);
    expect([commitA.status, commitB.status].sort()).toEqual([200, 409]);
    const [winner, loser] = commitA.status === 200 ? [a, b] : [b, a];
    const refused = commitA.status === 200 ? commitB : commitA;
    expect(refused.body.error.code).toBe("stale");
    expect(refused.body.error.message).toMatch(
      /^The catalogue changed since this preview was made: RCW-1 by Racewell Semis \(row 2\) is no longer as the preview showed it, so a commit now would write a different change\. Nothing was committed: preview the file again\.$/,
    );

    const [parts] = await sequelize.query(`SELECT id, part_number, vceo_volts, ptot_watts, lifecycle FROM parts WHERE manufacturer = $1 ORDER BY part_number`, {
      bind: [maker],
    });
    const values = (parts as Array<{ vceo_volts: number; ptot_watts: number; lifecycle: string }>).map((p) => [p.vceo_volts, p.ptot_watts, p.lifecycle]);
    const expected = winner === a ? [50, 0.6, "nrnd"] : [70, 0.8, "obsolete"];
    expect(values).toEqual([expected, expected]);

    for (const part of parts as Array<{ id: string }>) {
      const [revisions] = await sequelize.query(`SELECT intake_id, before, after FROM part_revisions WHERE part_id = $1 ORDER BY id`, { bind: [part.id] });
      const chain = revisions as Array<{ intake_id: string; before: Record<string, unknown> | null; after: Record<string, unknown> }>;
      expect(chain).toHaveLength(2);
      expect(chain[1]!.before).toEqual(chain[0]!.after);
      expect(chain[1]!.intake_id).toBe(winner.body.id);
    }

    // Previewed again, the losing file shows its change against the winner's values and commits.
    const again = await uploadIntake(second, "parts", loser === a ? "racewell-a.csv" : "racewell-b.csv", partsFile(loser === a ? fileA : fileB));
    expect(again.body.counts.changed).toBe(2);
    expect((await operate(second, again.body.id, "commit")).status).toBe(200);
  });

  it("commits a preview whose own parts did not change although the catalogue did", async () => {
    const preview = await uploadIntake(first, "parts", "calmwater.csv", partsFile([makeSpec("Calmwater Devices", "CWD-1")]));
    await commitParts(second, "elsewhere.csv", [makeSpec("Elsewhere Semis", "ELS-1")]);
    expect((await operate(first, preview.body.id, "commit")).status).toBe(200);
  });
});
