// Writes the demo catalogue and offers as intake files: npx tsx seeds/write-demo-fixtures.ts
import { mkdirSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { writeOffersCsv, writePartsCsv } from "#app/domain/intake/write-csv.ts";
import { demoOffers } from "#seeds/data/offers.ts";
import { demoParts } from "#seeds/data/parts.ts";

const FIXTURES_DIR = fileURLToPath(new URL("../fixtures/demo/", import.meta.url));

function writeDemoFixtures(): void {
  mkdirSync(FIXTURES_DIR, { recursive: true });
  writeFileSync(`${FIXTURES_DIR}parts.csv`, writePartsCsv(demoParts), "utf8");
  writeFileSync(`${FIXTURES_DIR}offers.csv`, writeOffersCsv(demoOffers), "utf8");
  console.log(`wrote ${demoParts.length} parts and ${demoOffers.length} offers to ${FIXTURES_DIR}`);
}

writeDemoFixtures();
