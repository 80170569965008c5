// Names with letters that PostgreSQL's lower() folds differently from JavaScript re-import and take offers like any
// other (issue item 13): final sigma (Σ, ς, σ) and dotted capital I (İ). Keys are computed once, in the app.
import { beforeAll, describe, expect, it } from "vitest";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { commitParts, LIBRARIAN, makeOffer, makeSpec, offersFile, operate, partsFile, uploadIntake } from "../setup/intake-helpers.ts";
import { readPart } from "./support/intake-fixtures.ts";

let agent: Agent;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
});

const GREEK = "ΚΥΜΑΤΟΣ Ημιαγωγοί";
const TURKISH = "İLKÖZ Yarıiletken";

describe("names that fold differently in PostgreSQL", () => {
  it("re-import unchanged, match offers typed in another case, and keep one part each", async () => {
    const parts = [makeSpec(GREEK, "ΚΣ-1"), makeSpec(TURKISH, "İK-1")];
    await commitParts(agent, "kymatos-ilkoz.csv", parts);
    const again = await uploadIntake(agent, "parts", "kymatos-ilkoz-again.csv", partsFile(parts));
    expect(again.status).toBe(201);
    expect(again.body.counts).toMatchObject({ new: 0, changed: 0, unchanged: 2, rejected: 0 });

    const offers = await uploadIntake(
      agent,
      "offers",
      "kymatos-ilkoz-offers.csv",
      offersFile([
        { manufacturer: "κυματοσ ημιαγωγοί", partNumber: "κς-1", offer: makeOffer("Harbourline Stock") },
        { manufacturer: TURKISH, partNumber: "İK-1", offer: makeOffer("Harbourline Stock") },
      ]),
    );
    expect(offers.body.problems).toEqual([]);
    expect(offers.body.counts).toMatchObject({ new: 2, rejected: 0 });
    expect((await operate(agent, offers.body.id, "commit")).status).toBe(200);
    expect((await readPart(agent, GREEK, "ΚΣ-1")).offers).toEqual([expect.objectContaining({ supplier: "Harbourline Stock" })]);
    expect((await readPart(agent, TURKISH, "İK-1")).offers).toEqual([expect.objectContaining({ supplier: "Harbourline Stock" })]);
    const listed = await agent.get("/api/parts").query({ q: "κυματοσ" });
    expect(listed.body.total).toBe(1);
  });
});
