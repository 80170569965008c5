// The rejected rows of an intake, for download: the stored file re-read, the stored problems attached.
import { QueryTypes } from "sequelize";
import { INTAKE_FORMATS } from "#app/domain/intake/columns.ts";
import type { IntakeKind, IntakeProblem } from "#app/domain/intake/problems.ts";
import { writeRejectedRows } from "#app/domain/intake/rejected-rows.ts";
import { db } from "#app/lib/db.server.ts";

export type RejectedRowsFile = { ok: true; fileName: string; csv: string } | { ok: false; status: 404 | 409; message: string };

/** `name-rejected.csv` for `name.csv`. */
function rejectedName(fileName: string): string {
  const dot = fileName.lastIndexOf(".");
  return `${dot > 0 ? fileName.slice(0, dot) : fileName}-rejected.csv`;
}

export async function getRejectedRows(id: string): Promise<RejectedRowsFile> {
  const sequelize = db().sequelize;
  const [intake] = await sequelize.query<{ kind: IntakeKind; file_name: string; file_bytes: Buffer; file_refused: boolean; rejected_count: number }>(
    `SELECT kind, file_name, file_bytes, file_refused, rejected_count FROM intakes WHERE id = $1`,
    { bind: [id], type: QueryTypes.SELECT },
  );
  if (!intake) return { ok: false, status: 404, message: "No intake has that id." };
  if (intake.file_refused) return { ok: false, status: 409, message: "The file itself could not be read, so it has no rejected rows to download: fix the file-level problem and upload it again." };
  if (intake.rejected_count === 0) return { ok: false, status: 409, message: "No row of this intake was rejected." };
  const problems = await sequelize.query<{ row_number: number; column_name: string | null; message: string }>(
    `SELECT row_number, column_name, message FROM intake_problems WHERE intake_id = $1 AND severity = 'error' AND row_number > 1 ORDER BY position`,
    { bind: [id], type: QueryTypes.SELECT },
  );
  const shown: IntakeProblem[] = problems.map((p) => ({ row: p.row_number, column: p.column_name, value: null, message: p.message, severity: "error" }));
  const csv = writeRejectedRows(new Uint8Array(intake.file_bytes), INTAKE_FORMATS[intake.kind], shown);
  if (csv === null) return { ok: false, status: 409, message: "The stored file could not be read again." };
  return { ok: true, fileName: rejectedName(intake.file_name), csv };
}
