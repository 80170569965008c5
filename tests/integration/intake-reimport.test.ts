// Re-imports change only what the file speaks about (issue item 12) and say what they leave out (item 16).
import { beforeAll, describe, expect, it } from "vitest";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { commitParts, LIBRARIAN, makeOffer, makeSpec, offersFile, operate, partsFile, uploadIntake } from "../setup/intake-helpers.ts";
import { readPart } from "./support/intake-fixtures.ts";

let agent: Agent;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
});

const csv = (lines: string[]) => Buffer.from(`${lines.join("\r\n")}\r\n`);

describe("a re-import with fewer columns", () => {
  it("keeps the values of columns the file leaves out, clears those of empty cells, and says which it clears", async () => {
    const maker = "Keepwell Devices";
    const base = makeSpec(maker, "KPW-1", { datasheetUrl: "https://datasheets.example.com/keepwell/kpw-1.pdf" });
    await commitParts(agent, "keepwell-full.csv", [base]);
    const preview = await uploadIntake(
      agent,
      "parts",
      "keepwell-short.csv",
      csv([
        "manufacturer,part_number,polarity,package,vceo,ic_max,cob,gain1_ic,gain1_hfe_min,gain1_hfe_max,gain2_ic,gain2_hfe_min",
        `${maker},KPW-1,NPN,TO-92,60 V,100 mA,,2 mA,110,450,50 mA,60`,
      ]),
    );
    expect(preview.status).toBe(201);
    expect(preview.body.counts).toMatchObject({ new: 0, changed: 1, rejected: 0 });
    expect(preview.body.changes[0].fields).toEqual([
      { field: "vceoVolts", before: 45, after: 60 },
      { field: "cobFarads", before: 4e-12, after: null, cleared: true },
    ]);
    expect((await operate(agent, preview.body.id, "commit")).status).toBe(200);
    const { part } = await readPart(agent, maker, "KPW-1");
    expect(part).toMatchObject({
      vceoVolts: 60,
      cobFarads: null,
      ftHz: base.ftHz,
      earlyVolts: base.earlyVolts,
      ptotWatts: base.ptotWatts,
      datasheetUrl: base.datasheetUrl,
      saturationPoints: base.saturationPoints,
      gainPoints: base.gainPoints,
    });
  });

  it("keeps offer fields the offers file has no column for", async () => {
    const maker = "Keepwell Offers";
    await commitParts(agent, "keepwell-offers-parts.csv", [makeSpec(maker, "KPO-1")]);
    const first = await uploadIntake(
      agent,
      "offers",
      "keepwell-offers-full.csv",
      offersFile([{ manufacturer: maker, partNumber: "KPO-1", offer: makeOffer("Harbourline Stock", { supplierSku: "HL-77", leadTimeDays: 28, minimumOrder: 10 }) }]),
    );
    expect((await operate(agent, first.body.id, "commit")).status).toBe(200);
    const second = await uploadIntake(
      agent,
      "offers",
      "keepwell-offers-stock.csv",
      csv(["manufacturer,part_number,supplier,stock,currency,as_of,break1_qty,break1_price,break2_qty,break2_price", `${maker},KPO-1,Harbourline Stock,40,EUR,2026-11-30,1,0.2,100,0.12`]),
    );
    expect(second.body.changes[0].fields).toEqual([{ field: "stock", before: 1000, after: 40 }]);
    expect((await operate(agent, second.body.id, "commit")).status).toBe(200);
    const { offers } = await readPart(agent, maker, "KPO-1");
    expect(offers[0]).toMatchObject({ stock: 40, supplierSku: "HL-77", leadTimeDays: 28, minimumOrder: 10 });
  });
});

describe("parts a re-import leaves out", () => {
  it("lists the manufacturer's catalogue parts the file does not name, and deletes none", async () => {
    const maker = "Missworth Semis";
    await commitParts(agent, "missworth-all.csv", ["MSW-1", "MSW-2", "MSW-3"].map((n) => makeSpec(maker, n)));
    const preview = await uploadIntake(agent, "parts", "missworth-some.csv", partsFile([makeSpec(maker, "MSW-1", { vceoVolts: 50 }), makeSpec(maker, "MSW-2")]));
    expect(preview.body.missingTotal).toBe(1);
    expect(preview.body.missingParts).toEqual([{ id: expect.any(String), manufacturer: maker, partNumber: "MSW-3" }]);
    expect((await operate(agent, preview.body.id, "commit")).status).toBe(200);
    expect((await readPart(agent, maker, "MSW-3")).part).toMatchObject({ partNumber: "MSW-3" });

    // A file that only adds a new part of the manufacturer replaces nothing, so it lists nothing.
    const adding = await uploadIntake(agent, "parts", "missworth-new.csv", partsFile([makeSpec(maker, "MSW-4")]));
    expect(adding.body).toMatchObject({ missingTotal: 0, missingParts: [] });
  });
});
