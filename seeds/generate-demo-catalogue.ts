// Regenerates the demo catalogue from the invented device families: npx tsx seeds/generate-demo-catalogue.ts
// Simulates every family's models in seeds/device-families/ with ngspice, quotes each part's datasheet figures by the
// rules in seeds/device-families/quote.ts, and writes seeds/data/generated-parts.ts, seeds/data/simulated-readings.csv
// and the intake files in fixtures/demo/ (parts, offers, and the messy librarian file).
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { demoOffers } from "#seeds/data/offers.ts";
import { DEMO_FIXTURES_DIR, renderDemoFixtures, writeDemoFixtureFiles } from "./demo-fixtures.ts";
import { generateCatalogue, renderGeneratedPartsModule, writeReadingsCsv } from "./device-families/catalogue.ts";

export const GENERATED_PARTS_PATH = fileURLToPath(new URL("./data/generated-parts.ts", import.meta.url));
export const SIMULATED_READINGS_PATH = fileURLToPath(new URL("./data/simulated-readings.csv", import.meta.url));

const started = performance.now();
const catalogue = generateCatalogue();
writeFileSync(GENERATED_PARTS_PATH, renderGeneratedPartsModule(catalogue), "utf8");
writeFileSync(SIMULATED_READINGS_PATH, writeReadingsCsv(catalogue.readings), "utf8");
const parts = catalogue.parts.map(({ spec }) => spec);
writeDemoFixtureFiles(renderDemoFixtures(parts, catalogue.messyIntakeParts.map(({ spec }) => spec), demoOffers));
const seconds = ((performance.now() - started) / 1000).toFixed(1);
console.log(`simulated ${catalogue.readings.length} families; wrote ${parts.length} parts, ${catalogue.messyIntakeParts.length} messy-intake parts,`);
console.log(`${demoOffers.length} offers to ${GENERATED_PARTS_PATH}, the readings and ${DEMO_FIXTURES_DIR} in ${seconds} s`);
