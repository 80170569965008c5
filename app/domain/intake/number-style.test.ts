import { describe, expect, it } from "vitest";
import { INTAKE_FORMATS } from "./columns";
import { NUMBER_STYLES } from "./number-style";
import { parsePartsFile } from "./parse-parts";

const HEADER = ["manufacturer", "part_number", "polarity", "package", "vceo", "ic_max", "gain1_ic", "gain1_hfe_min"];
const file = (delimiter: string, vceo: string) =>
  new TextEncoder().encode(`${HEADER.join(delimiter)}\r\n${["Stylewell Devices", "STW-1", "NPN", "TO-92", vceo, "100 mA", "2 mA", "110"].join(delimiter)}\r\n`);

// The formats page prints NUMBER_STYLES; this checks that the parser does what each printed rule says.
describe("number styles as documented", () => {
  it.each(NUMBER_STYLES.map((s) => [s.files, s]))("%s", (_files, style) => {
    const read = (vceo: string) => parsePartsFile(file(style.delimiter, vceo)).rows[0]?.value.vceoVolts ?? null;
    const comma = style.delimiter === "," ? '"0,65 V"' : "0,65 V";
    expect(read(comma)).toBe(0.65);
    expect(read("0.65 V")).toBe(0.65);
    expect(read(style.delimiter === "," ? '"1,000 V"' : "1,000 V")).toBe(style.decimalMark === "comma" ? 1 : null);
    expect(read("1.000 V")).toBe(style.decimalMark === "point" ? 1 : null);
  });

  it("covers every delimiter the reader sniffs", () => {
    expect(NUMBER_STYLES.map((s) => s.delimiter)).toEqual([",", ";", "\t", "|"]);
    expect(INTAKE_FORMATS.parts.columns.length).toBeGreaterThan(0);
  });
});
