import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { TopK } from "./top-k";

const byValueDesc = (a: number, b: number) => b - a;

describe("TopK", () => {
  it("keeps the k largest values, best first", () => {
    const heap = new TopK(3, byValueDesc);
    for (const value of [5, 1, 9, 3, 7, 2, 8]) heap.push(value);
    expect(heap.toSortedArray()).toEqual([9, 8, 7]);
    expect(heap.worst()).toBe(7);
    expect(heap.isFull).toBe(true);
  });

  it("admits anything until full, then only items that beat the worst kept", () => {
    const heap = new TopK(2, byValueDesc);
    expect(heap.admits(1)).toBe(true);
    heap.push(4);
    heap.push(6);
    expect(heap.admits(4)).toBe(false);
    expect(heap.push(3)).toBe(false);
    expect(heap.push(5)).toBe(true);
    expect(heap.toSortedArray()).toEqual([6, 5]);
  });

  it("keeps nothing when k is 0 and rejects a k that is not a whole number", () => {
    const heap = new TopK(0, byValueDesc);
    expect(heap.push(1)).toBe(false);
    expect(heap.size).toBe(0);
    expect(() => new TopK(-1, byValueDesc)).toThrow(RangeError);
    expect(() => new TopK(1.5, byValueDesc)).toThrow(RangeError);
  });

  it("matches a full sort on random input (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -50, max: 50 })), fc.integer({ min: 0, max: 12 }), (values, k) => {
        const heap = new TopK(k, byValueDesc);
        for (const value of values) heap.push(value);
        expect(heap.toSortedArray()).toEqual([...values].sort(byValueDesc).slice(0, k));
      }),
    );
  });
});
