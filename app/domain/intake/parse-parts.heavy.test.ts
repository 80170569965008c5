// The parts parser on a 100k-row file: the size a librarian may upload (kept out of the quick unit project).
import { describe, expect, it } from "vitest";
import type { PartSpec } from "../part";
import { parsePartsFile } from "./parse-parts";
import { writePartsCsv } from "./write-csv";

const encode = (text: string) => new TextEncoder().encode(text);

describe("parsePartsFile on a large file", () => {
  it("parses and validates a 100k-row parts file", () => {
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
