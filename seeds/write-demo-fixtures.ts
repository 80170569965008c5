// Rewrites fixtures/demo/ from the committed TypeScript data (after editing offers, say): npx tsx seeds/write-demo-fixtures.ts
// To regenerate the parts themselves from the device families, run seeds/generate-demo-catalogue.ts instead.
import { demoOffers } from "#seeds/data/offers.ts";
import { messyIntakeParts } from "#seeds/data/generated-parts.ts";
import { demoParts } from "#seeds/data/parts.ts";
import { DEMO_FIXTURES_DIR, renderDemoFixtures, writeDemoFixtureFiles } from "./demo-fixtures.ts";

writeDemoFixtureFiles(renderDemoFixtures(demoParts, messyIntakeParts, demoOffers));
console.log(`wrote ${demoParts.length} parts, ${demoOffers.length} offers and the messy file to ${DEMO_FIXTURES_DIR}`);
