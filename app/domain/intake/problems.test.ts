import { describe, expect, it } from "vitest";
import { cellProblem, countRejectedRows, fileProblem, hasFileError } from "./problems";

describe("intake problems", () => {
  it("counts each row with an error once, ignoring warnings and file-level problems", () => {
    const problems = [cellProblem(2, "vceo", "x", "bad"), cellProblem(2, "ic_max", "y", "bad"), cellProblem(4, "vceo", null, "odd", "warning"), fileProblem("The file is empty.")];
    expect(countRejectedRows(problems)).toBe(1);
  });

  it("tells a refused file (file-level or header error) from row errors", () => {
    expect(hasFileError([cellProblem(3, "vceo", "x", "bad")])).toBe(false);
    expect(hasFileError([cellProblem(1, "colour", "colour", "unknown", "warning")])).toBe(false);
    expect(hasFileError([cellProblem(1, "ic_max", "ic_max [V]", "bad unit")])).toBe(true);
    expect(hasFileError([fileProblem("The file is empty.")])).toBe(true);
  });

  it("shortens a long value to 80 characters in the problem", () => {
    expect(cellProblem(2, "package", "z".repeat(200), "too long").value).toBe(`${"z".repeat(80)}…`);
  });
});
