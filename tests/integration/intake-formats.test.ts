// The formats page and the parser agree on how each delimiter's numbers are read (issue item 18: tab files).
import { beforeAll, describe, expect, it } from "vitest";
import { NUMBER_STYLES } from "#app/domain/intake/number-style.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { LIBRARIAN, uploadIntake } from "../setup/intake-helpers.ts";

let agent: Agent;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
});

const escapeHtml = (text: string) => text.replaceAll("&", "&amp;").replaceAll('"', "&quot;").replaceAll("<", "&lt;").replaceAll(">", "&gt;");

describe("number formats on the formats page", () => {
  it("prints the parser's own rule for each delimiter", async () => {
    const page = await agent.get("/intakes/formats");
    expect(page.status).toBe(200);
    for (const style of NUMBER_STYLES) expect(page.text).toContain(escapeHtml(style.rule));
  });

  it("reads a tab-separated file as the page says: decimal commas and points, grouping refused either way", async () => {
    const header = ["manufacturer", "part_number", "polarity", "package", "vceo", "ic_max", "vbe_on", "gain1_ic", "gain1_hfe_min"];
    const rows = [
      ["Tabwell Devices", "TBW-1", "NPN", "TO-92", "45 V", "0,1 A", "0.65 V", "2 mA", "110"],
      ["Tabwell Devices", "TBW-2", "NPN", "TO-92", "1,000 V", "100 mA", "0.65 V", "2 mA", "110"],
      ["Tabwell Devices", "TBW-3", "NPN", "TO-92", "1.000 V", "100 mA", "0.65 V", "2 mA", "110"],
    ];
    const file = Buffer.from([header, ...rows].map((r) => r.join("\t")).join("\r\n"));
    const preview = await uploadIntake(agent, "parts", "tabwell.tsv", file);
    expect(preview.body.problems.map((p: { row: number; message: string }) => [p.row, p.message])).toEqual([
      [3, 'ambiguous: "1,000 V" is 1000 V if the comma groups digits, or 1 V if it is a decimal comma: write 1000 V or 1 V'],
      [4, 'ambiguous: "1.000 V" is 1000 V if the dot groups digits, or 1 V if it is a decimal point: write 1000 V or 1 V'],
    ]);
    expect(preview.body.counts).toMatchObject({ new: 1, rejected: 2 });
  });
});
