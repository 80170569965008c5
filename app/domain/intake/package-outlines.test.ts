import { describe, expect, it } from "vitest";
import { findPackageOutline, packageKey, resolvePackageOutline } from "./package-outlines";

describe("package outlines", () => {
  it.each([
    ["TO92", "TO-92"],
    ["to 92", "TO-92"],
    ["TO-92", "TO-92"],
    ["sot23", "SOT-23"],
    ["DPAK", "TO-252"],
    ["TO-3P", "TO-3P"],
  ])("reads %j as the %s outline", (typed, outline) => {
    expect(resolvePackageOutline(typed)).toBe(outline);
  });

  it("leaves an outline it does not know alone, and keys it by its letters and digits", () => {
    expect(resolvePackageOutline("TO-92 (ammo pack)")).toBeNull();
    expect(packageKey("TO-92 (ammo pack)")).toBe(packageKey("to92 ammo-pack"));
    expect(packageKey("TO92")).toBe("TO-92");
  });

  it("knows a current ceiling for each outline (from memory, generous)", () => {
    expect(findPackageOutline("TO-92")?.maxIcAmps).toBe(5);
    expect(findPackageOutline("TO-3")?.maxIcAmps).toBe(100);
  });
});
