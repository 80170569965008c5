import { describe, expect, it } from "vitest";
import { intakeReportMail } from "./intake-report-mail.ts";

const base = {
  to: "librarian@larkfield.example.com",
  displayName: "Lena Marsh",
  fileName: "parts.csv",
  kind: "parts" as const,
  committedAt: "2026-12-02T03:04:05.000Z",
  counts: { new: 3, changed: 1, unchanged: 0, rejected: 2, warnings: 1 },
  link: "http://127.0.0.1:3000/intakes/abc",
};

describe("intakeReportMail", () => {
  it("gives the counts, each problem with its place, and the link back", () => {
    const mail = intakeReportMail({
      ...base,
      problemsTotal: 2,
      problems: [
        { row: 4, column: "vceo", message: "VCEO must be above 0 V", severity: "error" },
        { row: 1, column: "colour", message: "unknown column", severity: "warning" },
      ],
    });
    expect(mail.to).toBe(base.to);
    expect(mail.subject).toBe("Betasift intake committed: parts.csv");
    expect(mail.text).toContain('Your intake "parts.csv" (parts) was committed to the catalogue on 2026-12-02 03:04 UTC.');
    expect(mail.text).toContain("  new: 3\n  changed: 1\n  unchanged: 0\n  rejected rows: 2\n  warnings: 1");
    expect(mail.text).toContain("  error at row 4, vceo: VCEO must be above 0 V");
    expect(mail.text).toContain(base.link);
  });

  it("says how many problems it leaves out", () => {
    const problems = Array.from({ length: 10 }, (_, i) => ({ row: i + 2, column: null, message: "bad", severity: "error" as const }));
    const mail = intakeReportMail({ ...base, problems, problemsTotal: 25 });
    expect(mail.text).toContain("Problems (25, the first 10 shown):");
    expect(intakeReportMail({ ...base, problems: [], problemsTotal: 0 }).text).toContain("The file had no problems.");
  });
});
