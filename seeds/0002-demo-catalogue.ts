// The demo catalogue, loaded the way a librarian would: fixtures/demo/parts.csv then offers.csv, each
// previewed and committed as the demo librarian through the intake path, so the demo has intakes,
// revisions and offers. The report e-mail is skipped: seeds run without the job queue's worker.
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";
import { commitIntake, previewIntake, rollbackIntake } from "#app/data/intakes.server.ts";
import { initModels } from "#db/models/index.ts";
import { demoPeople } from "./demo-people.ts";

const DEMO_FILES = [
  { kind: "parts" as const, fileName: "demo-parts.csv", path: "../fixtures/demo/parts.csv" },
  { kind: "offers" as const, fileName: "demo-offers.csv", path: "../fixtures/demo/offers.csv" },
];

const librarianEmail = demoPeople.find((p) => p.roles.includes("librarian"))!.email;

async function demoLibrarianId(): Promise<string> {
  const { User } = initModels();
  const librarian = await User.findOne({ where: { email: librarianEmail } });
  if (!librarian) throw new Error(`the demo catalogue needs the demo librarian ${librarianEmail} (seed 0001)`);
  return librarian.id;
}

export const up: MigrationFn<QueryInterface> = async () => {
  const { Intake } = initModels();
  const uploadedBy = await demoLibrarianId();
  for (const file of DEMO_FILES) {
    const already = await Intake.findOne({ where: { fileName: file.fileName, uploadedBy, state: "committed" } });
    if (already) continue;
    const bytes = new Uint8Array(readFileSync(fileURLToPath(new URL(file.path, import.meta.url))));
    const intake = await previewIntake({ kind: file.kind, fileName: file.fileName, bytes, uploadedBy });
    const committed = await commitIntake(intake.id, uploadedBy, { sendReport: false });
    if (!committed.ok) throw new Error(`demo ${file.fileName}: ${committed.message}`);
  }
};

export const down: MigrationFn<QueryInterface> = async () => {
  const { Intake } = initModels();
  const uploadedBy = await demoLibrarianId().catch(() => null);
  if (!uploadedBy) return;
  for (const file of [...DEMO_FILES].reverse()) {
    const intakes = await Intake.findAll({ where: { fileName: file.fileName, uploadedBy }, order: [["createdAt", "DESC"]] });
    for (const intake of intakes) {
      if (intake.state === "committed") {
        const undone = await rollbackIntake(intake.id, uploadedBy);
        if (!undone.ok) throw new Error(`demo ${file.fileName} cannot be removed: ${undone.message}`);
      }
      await intake.destroy();
    }
  }
};
