import { describe, expect, it } from "vitest";
import { MAX_READINGS, ReadingCollector } from "./readings";

describe("ReadingCollector", () => {
  it("groups the same reading of the same text in the same column, keeping the first rows", () => {
    const collector = new ReadingCollector();
    for (let row = 2; row < 100_002; row += 1) collector.add(row, { column: "break1_qty", value: "1+", reading: "read as 1 (from 1 on)" });
    expect(collector.list()).toEqual([{ column: "break1_qty", value: "1+", reading: "read as 1 (from 1 on)", count: 100_000, rows: [2, 3, 4, 5, 6] }]);
  });

  it("lists at most MAX_READINGS distinct readings and counts the cells past them", () => {
    const collector = new ReadingCollector();
    for (let n = 0; n < MAX_READINGS + 3; n += 1) collector.add(2 + n, { column: "gain1_hfe", value: `${n}-${n + 100}`, reading: "a range" });
    expect(collector.list()).toHaveLength(MAX_READINGS);
    expect(collector.overflow).toBe(3);
  });
});
