import { describe, expect, it } from "vitest";
import { parsePartsFile } from "./parse-parts";

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
});
