// Rejected rows can be fixed (issue item 17): downloaded with a problems column, corrected, uploaded again.
// Cells that a spreadsheet would run as formulas go out with a leading apostrophe (OWASP's advice on CSV injection).
import { beforeAll, describe, expect, it } from "vitest";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { LIBRARIAN, uploadIntake } from "../setup/intake-helpers.ts";

let agent: Agent;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
});

const csv = (lines: string[]) => Buffer.from(`${lines.join("\r\n")}\r\n`);
const HEADER = "manufacturer,part_number,polarity,package,vceo,ic_max,gain1_ic,gain1_hfe_min";

async function download(id: string) {
  return agent
    .get(`/intakes/${id}/rejected`)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => done(null, Buffer.concat(chunks)));
    });
}

describe("rejected rows download", () => {
  it("gives the rejected rows with their problems, formula-safe, ready to correct and upload again", async () => {
    const preview = await uploadIntake(
      agent,
      "parts",
      "fixwell parts.csv",
      csv([
        HEADER,
        "Fixwell Devices,FXW-1,NPN,TO-92,45 V,100 mA,2 mA,110",
        "Fixwell Devices,FXW-2,NPN,TO-92,45 Volt,100 mA,2 mA,110",
        '"=HYPERLINK(""http://attacker.example/"")",FXW-3,NPN,TO-92,-45 V,100 mA,2 mA,110',
      ]),
    );
    expect(preview.body.counts).toMatchObject({ new: 1, rejected: 2 });
    const response = await download(preview.body.id);
    expect(response.status).toBe(200);
    expect(response.headers["content-type"]).toBe("text/csv; charset=utf-8");
    expect(response.headers["content-disposition"]).toContain('filename="fixwell parts-rejected.csv"');
    const text = (response.body as Buffer).toString("utf8");
    expect(text.split("\r\n")).toEqual([
      `\uFEFFproblems,${HEADER}`,
      '"row 3: vceo: unknown unit ""Volt""",Fixwell Devices,FXW-2,NPN,TO-92,45 Volt,100 mA,2 mA,110',
      `"row 4: manufacturer: looks like a spreadsheet formula (starts with ""=""); formulas are not evaluated: enter the value itself; vceo: VCEO must be above zero (write PNP ratings as magnitudes, without the minus sign)","'=HYPERLINK(""http://attacker.example/"")",FXW-3,NPN,TO-92,"'-45 V",100 mA,2 mA,110`,
      "",
    ]);

    // Corrected in a spreadsheet: row 3's unit fixed; row 4 left as it was, so it is refused again for the same reasons.
    const corrected = Buffer.from(text.replace("45 Volt", "45 V"));
    const again = await uploadIntake(agent, "parts", "fixwell parts-rejected.csv", corrected);
    expect(again.body.problems.map((p: { row: number; column: string; message: string }) => [p.row, p.column, p.message])).toEqual([
      [3, "manufacturer", 'looks like a spreadsheet formula (starts with "="); formulas are not evaluated: enter the value itself'],
      [3, "vceo", "VCEO must be above zero (write PNP ratings as magnitudes, without the minus sign)"],
    ]);
    expect(again.body.counts).toMatchObject({ new: 1, rejected: 1, warnings: 0 });
  });

  it("keeps a semicolon file's delimiter, so its decimal commas still read as decimals", async () => {
    const preview = await uploadIntake(
      agent,
      "parts",
      "fixwell-semicolon.csv",
      csv([HEADER.replaceAll(",", ";"), "Fixwell Devices;FXW-5;NPN;TO-92;45 V;0,1 A;2 mA;110", "Fixwell Devices;FXW-6;NPN;TO-92;45 V;0,1 Amp;2 mA;110"]),
    );
    const text = (await download(preview.body.id)).body.toString("utf8") as string;
    expect(text.split("\r\n")[1]).toBe('"row 3: ic_max: unknown unit ""Amp""";Fixwell Devices;FXW-6;NPN;TO-92;45 V;0,1 Amp;2 mA;110');
  });

  it("answers 409 when nothing was rejected and 404 for an unknown intake", async () => {
    const clean = await uploadIntake(agent, "parts", "fixwell-clean.csv", csv([HEADER, "Fixwell Devices,FXW-9,NPN,TO-92,45 V,100 mA,2 mA,110"]));
    const response = await agent.get(`/intakes/${clean.body.id}/rejected`);
    expect(response.status).toBe(409);
    expect((await agent.get("/intakes/00000000-0000-4000-8000-000000000000/rejected")).status).toBe(404);
  });
});
