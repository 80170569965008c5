import { describe, expect, it } from "vitest";
import type { PartSpec } from "../part";
import { parsePartsFile } from "./parse-parts";
import { writePartsCsv } from "./write-csv";

const encode = (text: string) => new TextEncoder().encode(text);
const parse = (...lines: string[]) => parsePartsFile(encode(lines.join("\n")));
const HEADER = "manufacturer,part_number,polarity,package,vceo,ic_max,gain1_ic,gain1_hfe_min";
const GOOD = "Larkfield Semiconductor,LS-N100,NPN,TO-92,45 V,100 mA,2 mA,110";

describe("parsePartsFile", () => {
  it("fills defaults and nulls for columns the file leaves out", () => {
    const { rows, problems } = parse(HEADER, GOOD);
    expect(problems).toEqual([]);
    expect(rows).toEqual([
      {
        row: 2,
        value: {
          manufacturer: "Larkfield Semiconductor",
          partNumber: "LS-N100",
          polarity: "npn",
          packageName: "TO-92",
          configuration: "single",
          vceoVolts: 45,
          vcboVolts: null,
          veboVolts: null,
          icMaxAmps: 0.1,
          ptotWatts: null,
          ptotReference: null,
          tjMaxC: null,
          rthJaCPerW: null,
          rthJcCPerW: null,
          gainPoints: [{ icAmps: 0.002, vceVolts: null, hfeMin: 110, hfeTyp: null, hfeMax: null, tempC: null }],
          saturationPoints: [],
          vbeOnVolts: null,
          ftHz: null,
          cobFarads: null,
          earlyVolts: null,
          lifecycle: "active",
          datasheetUrl: null,
          datasheetRevisionDate: null,
        },
      },
    ]);
  });

  it("matches column names trimmed, in any case, with spaces or hyphens for underscores", () => {
    const { rows, problems } = parse(" Manufacturer , PART NUMBER,Polarity,Package,VCEO [kV],IC-Max [mA],Gain1_IC [µA],gain1_HFE_min", "Larkfield Semiconductor,LS-N100,npn,TO-92,0.045,100,2000,110");
    expect(problems).toEqual([]);
    expect(rows[0].value).toMatchObject({ vceoVolts: 45, icMaxAmps: 0.1, gainPoints: [{ icAmps: 0.002 }] });
  });

  it("reads gain points by their number, gaps allowed, in number order", () => {
    const { rows, problems } = parse(`${HEADER},gain3_ic,gain3_hfe_typ`, `${GOOD},100 mA,80`);
    expect(problems).toEqual([]);
    expect(rows[0].value.gainPoints.map((g) => [g.icAmps, g.hfeMin, g.hfeTyp])).toEqual([
      [0.002, 110, null],
      [0.1, null, 80],
    ]);
  });

  it("reads every comma as decimal only in semicolon files; elsewhere 1,250 stays ambiguous", () => {
    const semicolon = parse(HEADER.replaceAll(",", ";"), GOOD.replaceAll(",", ";").replace("100 mA", "1,250 A"));
    expect(semicolon.rows[0].value.icMaxAmps).toBe(1.25);
    const tab = parse(HEADER.replaceAll(",", "\t"), GOOD.replaceAll(",", "\t").replace("100 mA", "1,250 A"));
    expect(tab.problems.map((p) => p.message)).toEqual(['ambiguous: "1,250 A" is 1250 A if the comma groups digits, or 1.25 A if it is a decimal comma: write 1250 A or 1.25 A']);
  });

  it("accepts lifecycle labels as the catalogue shows them", () => {
    const { rows } = parse(`${HEADER},lifecycle`, `${GOOD},Not recommended for new designs`);
    expect(rows[0].value.lifecycle).toBe("nrnd");
  });

  it("counts rows as records, so a quoted newline does not shift later row numbers", () => {
    const { problems } = parse(HEADER, 'Larkfield Semiconductor,LS-N100,NPN,"TO-92\n\nbulk",45 V,100 mA,2 mA,110', "Larkfield Semiconductor,LS-N101,NPN,TO-92,45 V,100 mA,2 mA,-1");
    expect(problems.map((p) => [p.row, p.column, p.message])).toEqual([[3, "gain1_hfe_min", "gain point 1: hFE min must be above zero"]]);
  });

  it("skips blank lines but keeps the spreadsheet's row numbers", () => {
    const { rows } = parse(HEADER, "", GOOD, ",,,,,,,", GOOD.replace("LS-N100", "LS-N101"));
    expect(rows.map((r) => r.row)).toEqual([3, 5]);
  });

  it("keeps the cell as typed in the problem, shortened when very long", () => {
    const long = "x".repeat(501);
    const { problems } = parse(HEADER, GOOD.replace("TO-92", long));
    expect(problems).toEqual([
      { row: 2, column: "package", value: `${"x".repeat(80)}…`, message: "the cell is 501 characters long; at most 500 are accepted", severity: "error" },
    ]);
  });

  it("accepts a minus sign inside a text value that is a number (a package called -1 is odd but not a formula)", () => {
    expect(parse(HEADER, GOOD.replace("TO-92", "-1")).problems).toEqual([]);
  });

  it("parses and validates a 100k-row parts file", { timeout: 120_000 }, () => {
    const parts = Array.from({ length: 100_000 }, (_, i) => makePart(i));
    const result = parsePartsFile(encode(writePartsCsv(parts)));
    expect(result.problems).toEqual([]);
    expect(result.rows).toHaveLength(100_000);
    expect(result.rows[99_999]).toMatchObject({ row: 100_001, value: parts[99_999] });
  });
});

// Invented parts with varied values, so the quantity cache does not hide the parsing cost.
function makePart(i: number): PartSpec {
  const scale = 1 + (i % 997) / 100;
  return {
    manufacturer: `Larkfield Semiconductor ${i % 7}`,
    partNumber: `LS-${i.toString(36).toUpperCase()}`,
    polarity: i % 2 === 0 ? "npn" : "pnp",
    packageName: ["TO-92", "SOT-23", "TO-220"][i % 3],
    configuration: i % 11 === 0 ? "darlington" : "single",
    vceoVolts: 20 + (i % 300),
    vcboVolts: 30 + (i % 300),
    veboVolts: 5 + (i % 3),
    icMaxAmps: 0.1 * scale,
    ptotWatts: 0.5 * scale,
    ptotReference: i % 3 === 2 ? "case" : "ambient",
    tjMaxC: 150,
    rthJaCPerW: 200 / scale,
    rthJcCPerW: null,
    gainPoints: [
      { icAmps: 0.002 * scale, vceVolts: 5, hfeMin: 100 + (i % 50), hfeTyp: null, hfeMax: 400 + (i % 100), tempC: 25 },
      { icAmps: 0.1 * scale, vceVolts: 1, hfeMin: 40 + (i % 20), hfeTyp: 120, hfeMax: null, tempC: null },
    ],
    saturationPoints: [{ icAmps: 0.05 * scale, ibAmps: 0.005 * scale, vceSatMaxVolts: 0.3, vceSatTypVolts: null, vbeSatVolts: 0.9 }],
    vbeOnVolts: 0.65,
    ftHz: 1e8 * scale,
    cobFarads: 4e-12 * scale,
    earlyVolts: i % 5 === 0 ? null : 50 + (i % 100),
    lifecycle: "active",
    datasheetUrl: `https://example.com/datasheets/${i}.pdf`,
    datasheetRevisionDate: "2024-03-15",
  };
}
