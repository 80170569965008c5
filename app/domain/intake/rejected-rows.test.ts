import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { INTAKE_FORMATS } from "./columns";
import { parsePartsFile } from "./parse-parts";
import { writeRejectedRows } from "./rejected-rows";

const encode = (text: string) => new TextEncoder().encode(text);
const HEADER = "manufacturer,part_number,polarity,package,vceo,ic_max,gain1_ic,gain1_hfe_min";

describe("writeRejectedRows", () => {
  it("writes the rejected rows as uploaded with their problems first, and reads back to the same problems", () => {
    const bytes = encode(`${HEADER}\r\nGoodwell,GW-1,NPN,TO-92,45 V,100 mA,2 mA,110\r\n@SUM(A1),GW-2,NPN,TO-92,-45 V,100 mA,2 mA,110\r\n`);
    const parsed = parsePartsFile(bytes);
    const csv = writeRejectedRows(bytes, INTAKE_FORMATS.parts, parsed.problems)!;
    const [header, row] = Papa.parse<string[]>(csv.replace(/^\uFEFF/, ""), { skipEmptyLines: true }).data;
    expect(header).toEqual(["problems", ...HEADER.split(",")]);
    // OWASP's CSV-injection advice: a cell starting with = + - @ gets a leading apostrophe.
    expect(row).toEqual([
      expect.stringMatching(/^row 3: manufacturer: looks like a spreadsheet formula/),
      "'@SUM(A1)",
      "GW-2",
      "NPN",
      "TO-92",
      "'-45 V",
      "100 mA",
      "2 mA",
      "110",
    ]);
    const again = parsePartsFile(encode(csv));
    expect(again.problems.map((p) => [p.column, p.message])).toEqual(parsed.problems.map((p) => [p.column, p.message]));
  });

  it("has nothing to write for a file that cannot be read", () => {
    expect(writeRejectedRows(encode(""), INTAKE_FORMATS.parts, [])).toBeNull();
  });
});
