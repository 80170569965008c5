import { describe, expect, it } from "vitest";
import { compareVerdicts, computeMargin, mergeFlags, worstVerdict } from "./check-result";

describe("worstVerdict", () => {
  it("orders fits < marginal < fails", () => {
    expect(worstVerdict(["fits", "marginal", "fits"])).toBe("marginal");
    expect(worstVerdict(["marginal", "fails", "fits"])).toBe("fails");
    expect(worstVerdict(["fits"])).toBe("fits");
  });
  it("calls no verdicts at all a fit", () => {
    expect(worstVerdict([])).toBe("fits");
  });
});

describe("compareVerdicts", () => {
  it("sorts from best to worst", () => {
    expect((["fails", "fits", "marginal"] as const).slice().sort(compareVerdicts)).toEqual(["fits", "marginal", "fails"]);
  });
});

describe("computeMargin", () => {
  it("is the fractional headroom, negative past the limit", () => {
    expect(computeMargin(100, 75)).toBeCloseTo(0.25);
    expect(computeMargin(100, 120)).toBeCloseTo(-0.2);
  });
});

describe("mergeFlags", () => {
  it("keeps first-seen order without repeats", () => {
    expect(mergeFlags(["no-min-gain", "gain-off-point"], ["gain-off-point", "hot-junction"], [])).toEqual(["no-min-gain", "gain-off-point", "hot-junction"]);
  });
});
