// The demo's intake files in fixtures/demo/, rendered from the TypeScript data through the intake writers.
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { writeOffersCsv, writePartsCsv } from "#app/domain/intake/write-csv.ts";
import type { PartSpec } from "#app/domain/part.ts";
import type { DemoOffer } from "#seeds/data/offers.ts";
import { writeMessyPartsCsv } from "./messy-intake.ts";

export const DEMO_FIXTURES_DIR = fileURLToPath(new URL("../fixtures/demo/", import.meta.url));

/** File name in fixtures/demo/ → its text. */
export function renderDemoFixtures(parts: readonly PartSpec[], messyParts: readonly PartSpec[], offers: readonly DemoOffer[]): Record<string, string> {
  return {
    "parts.csv": writePartsCsv(parts),
    "offers.csv": writeOffersCsv(offers),
    "parts-messy.csv": writeMessyPartsCsv(messyParts, parts),
  };
}

export function writeDemoFixtureFiles(files: Record<string, string>): void {
  for (const [name, text] of Object.entries(files)) writeFileSync(`${DEMO_FIXTURES_DIR}${name}`, text, "utf8");
}
