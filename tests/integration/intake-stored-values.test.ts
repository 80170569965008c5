// Each bad fixture's accepted rows, committed: what the catalogue then holds, read back through the API, is what the
// librarian meant (issue items 11, 13, 14, 15). The readings the preview showed are checked beside the exact problems.
import { beforeAll, describe, expect, it } from "vitest";
import { BAD_FIXTURE_EXPECTATIONS } from "#fixtures/intake/expectations.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { LIBRARIAN, operate } from "../setup/intake-helpers.ts";
import { commitBadFixture, readPart, uploadBadFixture } from "./support/intake-fixtures.ts";

let agent: Agent;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
});

const withStoredValues = Object.entries(BAD_FIXTURE_EXPECTATIONS)
  .filter(([, expected]) => expected.stored)
  .map(([name]) => name)
  .sort();

describe("values stored from the bad fixtures' accepted rows", () => {
  it.each(withStoredValues)("%s stores what was meant", async (name) => {
    const expected = BAD_FIXTURE_EXPECTATIONS[name]!;
    if (expected.requires) await commitBadFixture(agent, expected.requires);
    const preview = await uploadBadFixture(agent, name);
    expect(preview.status).toBe(201);
    expect(preview.body.readings).toEqual(expected.readings ?? []);
    if (preview.body.canCommit) expect((await operate(agent, preview.body.id, "commit")).status).toBe(200);
    for (const stored of expected.stored!) {
      const { part, offers } = await readPart(agent, stored.manufacturer, stored.partNumber);
      if ("part" in stored) {
        expect(part).toMatchObject(stored.part);
      } else {
        expect(offers.find((o) => o.supplier === stored.supplier)).toMatchObject(stored.offer);
      }
    }
  });
});
