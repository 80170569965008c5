// Two intakes touching the same part, committed at the same moment: one waits for the other, never a mixed state.
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
  it("serialises two intakes that change the same parts; the revisions chain and each part holds one file's values", async () => {
    const maker = "Racewell Semis";
    const base = [makeSpec(maker, "RCW-1"), makeSpec(maker, "RCW-2")];
    await commitParts(first, "racewell-base.csv", base);
    const fileA = base.map((p) => ({ ...p, vceoVolts: 50, ptotWatts: 0.6, lifecycle: "nrnd" as const }));
    const fileB = base.map((p) => ({ ...p, vceoVolts: 70, ptotWatts: 0.8, lifecycle: "obsolete" as const }));
    const a = await uploadIntake(first, "parts", "racewell-a.csv", partsFile(fileA));
    const b = await uploadIntake(second, "parts", "racewell-b.csv", partsFile(fileB));
    expect([a.body.counts.changed, b.body.counts.changed]).toEqual([2, 2]);

    const [commitA, commitB] = await Promise.all([operate(first, a.body.id, "commit"), operate(second, b.body.id, "commit")]);
    expect([commitA.status, commitB.status]).toEqual([200, 200]);

    const [parts] = await sequelize.query(`SELECT id, part_number, vceo_volts, ptot_watts, lifecycle FROM parts WHERE manufacturer = $1 ORDER BY part_number`, {
      bind: [maker],
    });
    const values = (parts as Array<{ vceo_volts: number; ptot_watts: number; lifecycle: string }>).map((p) => [p.vceo_volts, p.ptot_watts, p.lifecycle]);
    const [last] = new Date(commitA.body.committedAt) > new Date(commitB.body.committedAt) ? ["a"] : ["b"];
    const expected = last === "a" ? [50, 0.6, "nrnd"] : [70, 0.8, "obsolete"];
    expect(values).toEqual([expected, expected]);

    for (const part of parts as Array<{ id: string }>) {
      const [revisions] = await sequelize.query(`SELECT intake_id, before, after FROM part_revisions WHERE part_id = $1 ORDER BY id`, { bind: [part.id] });
      const chain = revisions as Array<{ intake_id: string; before: Record<string, unknown> | null; after: Record<string, unknown> }>;
      expect(chain).toHaveLength(3);
      expect(chain[0]!.before).toBeNull();
      // Each commit recorded as "before" exactly what the previous one wrote.
      expect(chain[1]!.before).toEqual(chain[0]!.after);
      expect(chain[2]!.before).toEqual(chain[1]!.after);
      expect(chain.map((r) => r.intake_id).slice(1)).toEqual(last === "a" ? [b.body.id, a.body.id] : [a.body.id, b.body.id]);
    }
  });
});
