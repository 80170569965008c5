import { describe, expect, it } from "vitest";
import { readHfe } from "./hfe-notation";

const hfe = (hfeMin: number | null, hfeTyp: number | null, hfeMax: number | null) => ({ kind: "hfe", hfeMin, hfeTyp, hfeMax });

describe("readHfe", () => {
  it.each([
    ["100-300", hfe(100, null, 300), "read as hFE min 100, hFE max 300"],
    ["100 – 300", hfe(100, null, 300), "read as hFE min 100, hFE max 300"],
    ["100 to 300", hfe(100, null, 300), "read as hFE min 100, hFE max 300"],
    ["≥ 100", hfe(100, null, null), "read as hFE min 100"],
    [">= 100", hfe(100, null, null), "read as hFE min 100"],
    ["min 100", hfe(100, null, null), "read as hFE min 100"],
    ["≤ 300", hfe(null, null, 300), "read as hFE max 300"],
    ["typ 200", hfe(null, 200, null), "read as hFE typ 200"],
    ["typ. 200", hfe(null, 200, null), "read as hFE typ 200"],
  ])("reads %j in the hfe column", (cell, value, reading) => {
    expect(readHfe(cell, null)).toEqual({ ok: true, value, reading });
  });

  it("gives a plain number when the qualifier matches the column", () => {
    expect(readHfe("≥ 100", "hfeMin")).toEqual({ ok: true, value: 100, reading: "read as hFE min 100" });
    expect(readHfe("typ 200", "hfeMin")).toEqual({ ok: true, value: hfe(null, 200, null), reading: "read as hFE typ 200" });
  });

  it("asks what a plain number is in the hfe column, and refuses a range from high to low", () => {
    expect(readHfe("150", null)).toEqual({
      ok: false,
      recognised: true,
      message: 'say which value "150" is: write ≥ 150 for a minimum, typ 150, ≤ 150 for a maximum, or a range such as 100-300',
    });
    expect(readHfe("300-100", null)).toMatchObject({ ok: false, message: 'the range "300-100" runs from high to low; write the lower value first (100-300)' });
    expect(readHfe("lots", "hfeMin")).toMatchObject({ ok: false, recognised: false });
  });
});
