// The committed demo catalogue is exactly what seeds/generate-demo-catalogue.ts makes from the invented device families
// in seeds/device-families/: every figure a datasheet reads off the silicon was simulated by ngspice from those models.
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { beforeAll, describe, expect, it } from "vitest";
import { messyIntakeParts } from "#seeds/data/generated-parts.ts";
import { demoOffers } from "#seeds/data/offers.ts";
import { renderDemoFixtures } from "#seeds/demo-fixtures.ts";
import {
  DEVICE_FAMILIES,
  type GeneratedCatalogue,
  generateCatalogue,
  renderGeneratedPartsModule,
  writeReadingsCsv,
} from "#seeds/device-families/catalogue.ts";
import { libraryPath } from "#seeds/device-families/simulate.ts";
import { requireNgspice, simulate, valueAt, vectorOf } from "./ngspice.ts";

const read = (relative: string) => readFileSync(fileURLToPath(new URL(relative, import.meta.url)), "utf8");
const REGENERATE = "rerun npx tsx seeds/generate-demo-catalogue.ts";

let catalogue: GeneratedCatalogue;

beforeAll(() => {
  // No skipping: without ngspice this fails with the install command in the message.
  requireNgspice();
  catalogue = generateCatalogue();
});

describe("the demo catalogue regenerated from the device families", () => {
  it(`matches seeds/data/generated-parts.ts line for line (${REGENERATE})`, () => {
    expect(read("../../seeds/data/generated-parts.ts")).toBe(renderGeneratedPartsModule(catalogue));
  });

  it(`matches every simulated reading in seeds/data/simulated-readings.csv (${REGENERATE})`, () => {
    expect(read("../../seeds/data/simulated-readings.csv")).toBe(writeReadingsCsv(catalogue.readings));
  });

  it(`matches the intake files in fixtures/demo/ (${REGENERATE})`, () => {
    const parts = catalogue.parts.map(({ spec }) => spec);
    const rendered = renderDemoFixtures(parts, catalogue.messyIntakeParts.map(({ spec }) => spec), demoOffers);
    for (const [name, text] of Object.entries(rendered)) expect(read(`../../fixtures/demo/${name}`), name).toBe(text);
    expect(catalogue.messyIntakeParts.map(({ spec }) => spec)).toEqual(messyIntakeParts);
  });
});

describe("the device families", () => {
  it("each have one model library that defines the devices they name", () => {
    expect(new Set(DEVICE_FAMILIES.map((family) => family.id)).size).toBe(DEVICE_FAMILIES.length);
    for (const family of DEVICE_FAMILIES) {
      const library = readFileSync(libraryPath(family), "utf8");
      for (const device of Object.values(family.devices)) {
        const pattern = device.kind === "model" ? new RegExp(`^\\.model\\s+${device.name}\\s`, "im") : new RegExp(`^\\.subckt\\s+${device.name}\\s`, "im");
        expect(pattern.test(library), `${family.id}: ${device.name}`).toBe(true);
      }
    }
  });

  it("are read the same by a plain one-device netlist as by the generator's shared netlists", () => {
    // Reference: ngspice, seeds/device-families/osk27.lib model OSK27P alone in the test harness's netlist: a VBE sweep
    // at VCE = −2 V (hFE = IC / IB at 5 mA) and a forced-gain sweep (IC = 10 × IB up to 250 mA) for VCE(sat).
    const family = DEVICE_FAMILIES.find((candidate) => candidate.id === "osk27")!;
    const readings = catalogue.readings.find((entry) => entry.family === family)!.readings.pnp!;
    const include = `.include ${libraryPath(family)}\n.options tnom=25\n.temp 25`;
    const sweep = simulate({
      title: "OSK27P gain at VCE -2 V",
      circuit: `${include}\nVC c 0 -2\nVB b 0 0\nQ1 c b 0 OSK27P`,
      analysis: "dc VB -0.3 -1.3 -0.0005",
      vectors: ["i(VC)", "i(VB)"],
    });
    const ic = vectorOf(sweep, "i(VC)");
    const ib = vectorOf(sweep, "i(VB)");
    const logHfe = valueAt(ic.map(Math.log), ic.map((value, k) => Math.log(value / ib[k])), Math.log(5e-3));
    expect(Math.exp(logHfe) / readings.gain[1]).toBeCloseTo(1, 3);
    const sat = simulate({
      title: "OSK27P saturation at forced gain 10",
      circuit: `${include}\nIB bb 0 20u\nVIB b bb 0\nF1 c 0 VIB 10\nQ1 c b 0 OSK27P`,
      analysis: "dc IB 25u 25m 25u",
      vectors: ["v(c)"],
    });
    const vce = vectorOf(sat, "v(c)");
    expect(-vce[vce.length - 1] / readings.saturation[1].vceSatVolts).toBeCloseTo(1, 3);
  });
});
