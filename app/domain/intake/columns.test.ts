import { describe, expect, it } from "vitest";
import { INTAKE_FORMATS, listColumnDocs, MAX_INTAKE_BYTES, templateCsv } from "./columns";
import { parseOffersFile } from "./parse-offers";
import { parsePartsFile } from "./parse-parts";

const encode = (text: string) => new TextEncoder().encode(text);

describe("intake formats", () => {
  it("caps uploads at 20 MiB", () => {
    expect(MAX_INTAKE_BYTES).toBe(20_971_520);
  });

  it("gives templates that parse into one row without a problem", () => {
    const parts = parsePartsFile(encode(templateCsv("parts")));
    expect(parts.problems).toEqual([]);
    expect(parts.rows).toHaveLength(1);
    expect(parts.rows[0].value).toMatchObject({ partNumber: "TW-G3152", vceoVolts: 55, icMaxAmps: 1.8, ftHz: 6.2e7 });
    const offers = parseOffersFile(encode(templateCsv("offers")));
    expect(offers.problems).toEqual([]);
    expect(offers.rows[0].value.offer).toMatchObject({ stock: 6900, currency: "EUR", priceBreaks: [{ quantity: 1, unitPrice: 0.27 }] });
  });

  it("starts each template with the header the documentation lists", () => {
    const header = templateCsv("parts").split("\r\n")[0].split(",");
    // The hfe column is another way to write hFE min, typ and max, so the template leaves it out.
    const documented = listColumnDocs("parts").map((d) => d.name.replace("N_", "1_")).filter((name) => name !== "gain1_hfe");
    expect(header).toEqual(documented);
  });

  it("documents every column with its unit, requirement, example and plausible range", () => {
    const docs = listColumnDocs("parts");
    expect(docs.find((d) => d.name === "vceo")).toEqual({
      name: "vceo",
      label: "VCEO",
      type: "voltage",
      unit: "V",
      required: "yes",
      description: "Collector-emitter voltage rating, base open.",
      example: "55 V",
      plausible: "above 0 V up to 3 kV",
    });
    expect(docs.find((d) => d.name === "gainN_hfe_min")).toMatchObject({ type: "number, or a range 100-300", unit: "", plausible: "above 0 up to 100000" });
    expect(docs.find((d) => d.name === "gainN_ic")?.required).toBe("when the gain point is given; at least one point per row");
    expect(docs.find((d) => d.name === "tj_max")?.plausible).toBe("0 °C to 300 °C");
    expect(listColumnDocs("offers").map((d) => d.name)).toEqual([...INTAKE_FORMATS.offers.columns.map((c) => c.name), "breakN_qty", "breakN_price"]);
  });

  it("gives every column a description and an example", () => {
    for (const kind of ["parts", "offers"] as const) {
      for (const doc of listColumnDocs(kind)) {
        expect(doc.description.length).toBeGreaterThan(5);
        expect(doc.example).not.toBe("");
      }
    }
  });
});
