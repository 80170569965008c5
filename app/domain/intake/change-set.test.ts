import { describe, expect, it } from "vitest";
import { findChangedRow } from "./change-set";

const value = { manufacturer: "Racewell Semis", partNumber: "RCW-1" };

describe("findChangedRow", () => {
  it("holds when every row has the same status and changes, ignoring the cleared marks", () => {
    const preview = [{ row: 2, status: "changed", value, changes: [{ field: "cobFarads", before: 4e-12, after: null, cleared: true }] }];
    const now = [{ row: 2, status: "changed", value, changes: [{ field: "cobFarads", before: 4e-12, after: null }] }];
    expect(findChangedRow(preview, now)).toBeNull();
  });

  it("names the first row whose change differs, or that is gone", () => {
    const preview = [
      { row: 2, status: "changed", value, changes: [{ field: "vceoVolts", before: 45, after: 50 }] },
      { row: 3, status: "new", value, changes: [] },
    ];
    expect(findChangedRow(preview, [{ ...preview[0]!, changes: [{ field: "vceoVolts", before: 70, after: 50 }] }, preview[1]!])).toBe(preview[0]);
    expect(findChangedRow(preview, [preview[0]!])).toBe(preview[1]);
  });
});
