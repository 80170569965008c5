import { describe, expect, it } from "vitest";
import { MAX_PROBLEMS, ProblemCollector } from "./problem-cap";
import { cellProblem } from "./problems";

describe("ProblemCollector", () => {
  it("keeps every problem under the cap", () => {
    const collector = new ProblemCollector([]);
    collector.add(2, [cellProblem(2, "vceo", "x", "bad")]);
    expect(collector.withinCap()).toBe(true);
    expect(collector.list()).toHaveLength(1);
  });

  it("stops past the cap with a summary of the most frequent problems", () => {
    const collector = new ProblemCollector([]);
    for (let row = 2; collector.withinCap(); row += 1) {
      collector.add(row, [cellProblem(row, "vceo", "x", "unknown unit"), ...(row % 2 ? [cellProblem(row, "ic_max", "y", "required")] : [])]);
    }
    const problems = collector.list();
    expect(problems).toHaveLength(MAX_PROBLEMS + 1);
    expect(problems.at(-1)).toMatchObject({
      row: null,
      severity: "error",
      message: `More than ${MAX_PROBLEMS} problems: reading stopped at row 669, and nothing from this file can be committed. Most frequent: vceo: unknown unit (668 times); ic_max: required (334 times). Fix these in the file and upload it again.`,
    });
  });
});
