// What the intake report e-mail needs: the uploader's address, the counts and the first problems.
import { QueryTypes } from "sequelize";
import type { IntakeReportInput } from "#app/lib/intake-report-mail.ts";
import { db } from "#app/lib/db.server.ts";

interface ReportSql {
  email: string;
  display_name: string;
  file_name: string;
  kind: "parts" | "offers";
  committed_at: Date | null;
  new_count: number;
  changed_count: number;
  unchanged_count: number;
  rejected_count: number;
  warning_count: number;
  problem_count: number;
}

/** The report of one intake, without its link; null when the intake or its uploader is gone. */
export async function getIntakeReport(intakeId: string): Promise<Omit<IntakeReportInput, "link"> | null> {
  const sequelize = db().sequelize;
  const [row] = await sequelize.query<ReportSql>(
    `SELECT u.email, u.display_name, i.file_name, i.kind, i.committed_at, i.new_count, i.changed_count, i.unchanged_count,
       i.rejected_count, i.warning_count, i.problem_count
     FROM intakes i JOIN users u ON u.id = i.uploaded_by WHERE i.id = $1`,
    { bind: [intakeId], type: QueryTypes.SELECT },
  );
  if (!row) return null;
  const problems = await sequelize.query<{ row_number: number | null; column_name: string | null; message: string; severity: "error" | "warning" }>(
    `SELECT row_number, column_name, message, severity FROM intake_problems WHERE intake_id = $1 ORDER BY position LIMIT 10`,
    { bind: [intakeId], type: QueryTypes.SELECT },
  );
  return {
    to: row.email,
    displayName: row.display_name,
    fileName: row.file_name,
    kind: row.kind,
    committedAt: row.committed_at ? new Date(row.committed_at).toISOString() : null,
    counts: { new: row.new_count, changed: row.changed_count, unchanged: row.unchanged_count, rejected: row.rejected_count, warnings: row.warning_count },
    problems: problems.map((p) => ({ row: p.row_number, column: p.column_name, message: p.message, severity: p.severity })),
    problemsTotal: row.problem_count,
  };
}
