import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cleanName, identityKey } from "./identity";

describe("identityKey", () => {
  // Unicode CaseFolding.txt: U+03A3 Σ, U+03C3 σ and U+03C2 ς all fold to σ; U+0130 İ folds to i + U+0307; ß to ss.
  it.each([
    ["ΚΥΜΑΤΟΣ", "κυματοσ"],
    ["ΚΥΜΑΤΟΣ", "κυματος"],
    ["İLKÖZ", "i̇lköz"],
    ["Straße", "STRASSE"],
    ["LW‐1", "lw-1"],
    ["Lookwell\u200b Devices", "LOOKWELL DEVICES"],
    ["  Larkfield   Semiconductor ", "larkfield semiconductor"],
    ["ＬＳ－Ｎ１００", "ls-n100"],
  ])("gives %j and %j one key", (a, b) => {
    expect(identityKey(a)).toBe(identityKey(b));
  });

  it("keeps names apart that differ in more than look", () => {
    expect(identityKey("LS-N100")).not.toBe(identityKey("LS-N1OO"));
    expect(identityKey("İLKÖZ")).not.toBe(identityKey("ILKOZ"));
  });

  it("is idempotent and never depends on case", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 20 }), (name) => {
        expect(identityKey(identityKey(name))).toBe(identityKey(name));
        expect(identityKey(name.toUpperCase())).toBe(identityKey(name.toLowerCase()));
      }),
    );
  });
});

describe("cleanName", () => {
  it("removes invisible characters, unifies dashes and collapses spaces, keeping the case", () => {
    expect(cleanName(" Lookwell\u200b\u00ad  Devices\r\n(tape) ")).toBe("Lookwell Devices (tape)");
    expect(cleanName("LW\u20111")).toBe("LW-1");
  });
});
