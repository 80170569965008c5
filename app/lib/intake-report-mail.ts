// The e-mail a librarian gets after committing an intake: counts, the problems in short, a link back.
export interface IntakeReportInput {
  to: string;
  displayName: string;
  fileName: string;
  kind: "parts" | "offers";
  committedAt: string | null;
  counts: { new: number; changed: number; unchanged: number; rejected: number; warnings: number };
  problems: Array<{ row: number | null; column: string | null; message: string; severity: "error" | "warning" }>;
  problemsTotal: number;
  link: string;
}

const SHOWN_PROBLEMS = 10;

function where(problem: IntakeReportInput["problems"][number]): string {
  if (problem.row === null) return "file";
  return problem.column ? `row ${problem.row}, ${problem.column}` : `row ${problem.row}`;
}

export function intakeReportMail(input: IntakeReportInput) {
  const noun = input.kind === "parts" ? "parts" : "offers";
  const { counts } = input;
  const lines = [
    `Hello ${input.displayName},`,
    "",
    `Your intake "${input.fileName}" (${noun}) was committed to the catalogue${input.committedAt ? ` on ${input.committedAt.replace("T", " ").slice(0, 16)} UTC` : ""}.`,
    "",
    `  new: ${counts.new}`,
    `  changed: ${counts.changed}`,
    `  unchanged: ${counts.unchanged}`,
    `  rejected rows: ${counts.rejected}`,
    `  warnings: ${counts.warnings}`,
    "",
  ];
  if (input.problemsTotal === 0) {
    lines.push("The file had no problems.");
  } else {
    lines.push(`Problems (${input.problemsTotal}${input.problemsTotal > SHOWN_PROBLEMS ? `, the first ${SHOWN_PROBLEMS} shown` : ""}):`);
    for (const problem of input.problems.slice(0, SHOWN_PROBLEMS)) lines.push(`  ${problem.severity} at ${where(problem)}: ${problem.message}`);
  }
  lines.push("", `The full report, and rollback if something is wrong: ${input.link}`);
  return { to: input.to, subject: `Betasift intake committed: ${input.fileName}`, text: lines.join("\n") };
}
