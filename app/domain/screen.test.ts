// The judgement/explanation split: screening alone must agree with the full explanations it skips.
import { describe, expect, it } from "vitest";
import { generateParts } from "#tests/bench/generate-parts.ts";
import { FLAG_BITS, FLAG_NAMES, flagsOfMask, maskOfFlags, worseVerdict, worstVerdict } from "./check-result";
import { checkThermal, explainThermal, judgeThermal, newThermalJudgement, type ThermalCheckInput } from "./checks/thermal";
import { checkVoltage, explainVoltage, judgeVoltage, newVoltageJudgement } from "./checks/voltage";
import { evaluateCompound, explainCompound } from "./compound-explain";
import { screenCompound } from "./compound-screen";
import { DEFAULT_DERATING } from "./derating";
import { evaluatePart, explainScreen, isExcluded, isOutsidePackages, newPartScreen, preparePart, qualityOf, screenPart } from "./evaluate-part";
import { explainGainReading, interpolateLogLog, newGainReading, prepareGain, ratioDistance, readWorstCaseGain, vceSatAt, worstCaseGain } from "./gain-curve";
import { prepareCatalogue, rankParts, rankPrepared, supplyOf } from "./rank";
import { parseRequirementSheet, presets } from "./requirement";
import { packageKeyOf, planSheet } from "./screening";
import { combineScore, combineScoreParts, scoreDataQuality, scoreLeastMargin, scoreMargins, scoreRecordQuality } from "./score";

const catalogue = generateParts(300, 5);
const sheets = [
  ...presets.map((p) => p.sheet),
  parseRequirementSheet({ supplyVolts: 12, operatingIcAmps: 0.05, mode: "switching", reverseVbeVolts: 5, packages: ["TO-92", " sot-23"], drive: { kind: "source", volts: 5, sourceOhms: 470 } }),
];

describe("flag masks and verdicts", () => {
  it("maps flags to one bit each and back in FLAG_NAMES order", () => {
    expect(new Set(Object.values(FLAG_BITS)).size).toBe(FLAG_NAMES.length);
    expect(flagsOfMask(maskOfFlags(["hot-junction", "gain-off-point"]))).toEqual(["gain-off-point", "hot-junction"]);
    expect(flagsOfMask(0)).toEqual([]);
  });
  it("takes the worse of two verdicts as worstVerdict does", () => {
    for (const a of ["fits", "marginal", "fails"] as const) for (const b of ["fits", "marginal", "fails"] as const) expect(worseVerdict(a, b)).toBe(worstVerdict([a, b]));
  });
});

describe("judgements and explanations", () => {
  const thermal: ThermalCheckInput = {
    mode: "linear",
    vceVolts: 5,
    icAmps: 1,
    dutyCycle: 1,
    ambientC: 40,
    rthJaCPerW: 62.5,
    rthJcCPerW: null,
    heatsinkRthCPerW: 3,
    tjMaxC: 150,
    ptotWatts: 40,
    ptotReference: "case",
    derating: DEFAULT_DERATING,
  };
  it("give the check's result, and a reused judgement object gives it again", () => {
    const scratch = newThermalJudgement();
    judgeThermal({ ...thermal, icAmps: 0.01 }, scratch);
    expect(explainThermal(thermal, judgeThermal(thermal, scratch))).toEqual(checkThermal(thermal));
    const voltage = { peakVceVolts: 40, vceoVolts: 45, reverseVbeVolts: 7, veboVolts: 6, voltageFraction: 0.8 };
    const judged = judgeVoltage(voltage, newVoltageJudgement());
    expect(judged.flags).toBe(FLAG_BITS["inside-derating"] | FLAG_BITS["rating-below-supply"]);
    expect(explainVoltage(voltage, judged)).toEqual(checkVoltage(voltage));
    expect(checkVoltage(voltage).flags).toEqual(["inside-derating", "rating-below-supply"]);
  });
  it("read the gain curve as worstCaseGain does, from prepared log-space curves", () => {
    for (const { part } of catalogue.slice(0, 50)) {
      for (const ic of [1e-4, 0.01, 0.5, 3]) {
        const reading = readWorstCaseGain(prepareGain(part.gainPoints), ic, 0.5, 0.5, newGainReading());
        expect(explainGainReading(reading)).toEqual(worstCaseGain(part.gainPoints, ic));
      }
    }
    const curve = prepareGain([{ icAmps: 1e-3, vceVolts: 5, hfeMin: 100, hfeTyp: null, hfeMax: null, tempC: 25 }, { icAmps: 0.1, vceVolts: 5, hfeMin: 50, hfeTyp: null, hfeMax: null, tempC: 25 }]).min;
    expect(curve && interpolateLogLog(curve, 0.01)).toBeCloseTo(Math.sqrt(100 * 50), 9);
    expect(ratioDistance(2, 1)).toBe(2);
    expect(ratioDistance(1, 4)).toBe(4);
  });
});

describe("screenPart", () => {
  it("agrees with evaluatePart on verdict, tightest margin, flags and the numbers the pages show", () => {
    for (const sheet of sheets) {
      for (const options of [{}, { todayIso: "2026-12-01", typToMinFactor: 0.4 }]) {
        const plan = planSheet(sheet, options);
        const screen = newPartScreen(plan);
        for (const { part } of catalogue) {
          const evaluation = evaluatePart(part, sheet, options);
          screenPart(preparePart(part), plan, screen);
          const margins = evaluation.checks.map((c) => c.margin).filter((m): m is number => m !== null);
          expect(screen.verdict).toBe(evaluation.verdict);
          expect(screen.margin).toBe(margins.length === 0 ? null : Math.min(...margins));
          expect(screen.flags).toBe(maskOfFlags(evaluation.flags));
          expect(screen.hfeAtOperatingPoint).toBe(evaluation.hfeAtOperatingPoint);
          expect(screen.junctionC).toBe(evaluation.junctionC);
          expect(screen.vceSatVolts).toBe(evaluation.vceSatVolts);
          expect(explainScreen(screen, plan)).toEqual(evaluation);
        }
      }
    }
  });
  it("excludes by polarity and trimmed, case-blind package names, and keeps data quality per date", () => {
    const sheet = sheets[sheets.length - 1];
    const plan = planSheet(sheet);
    const part = { ...catalogue[0].part, packageName: " SOT-23 ", polarity: "pnp" as const };
    expect(packageKeyOf(" SOT-23 ")).toBe("sot-23");
    expect(isOutsidePackages(preparePart(part), plan)).toBe(false);
    expect(isExcluded(preparePart({ ...part, packageName: "TO-220" }), plan)).toBe(true);
    const prepared = preparePart({ ...part, datasheetRevisionDate: "2001-01-01" });
    expect(qualityOf(prepared, plan).flags).not.toContain("stale-datasheet");
    expect(qualityOf(prepared, planSheet(sheet, { todayIso: "2026-12-01" })).flags).toContain("stale-datasheet");
  });
});

describe("rankParts on a prepared catalogue", () => {
  it("reuses the preparation for one catalogue version and prepares again for another", () => {
    const first = prepareCatalogue(catalogue, "v1");
    expect(prepareCatalogue(catalogue, "v1")).toBe(first);
    expect(prepareCatalogue(catalogue, "v2")).not.toBe(first);
    expect(supplyOf(first.parts[0], 100, null)).toBe(supplyOf(first.parts[0], 100, null));
  });
  it("scores from the screen exactly as from the full explanations, and explains rows when they are read", () => {
    for (const sheet of sheets) {
      const ranking = rankParts(catalogue, sheet, { catalogueVersion: "v1", evaluate: { todayIso: "2026-12-01" } });
      expect(rankPrepared(prepareCatalogue(catalogue, "v1"), sheet, { catalogueVersion: "v1", evaluate: { todayIso: "2026-12-01" } }).ranked.map((r) => r.score)).toEqual(
        ranking.ranked.map((r) => r.score),
      );
      for (const row of ranking.ranked.slice(0, 30)) {
        expect(row.evaluation).toEqual(evaluatePart(row.part, sheet, { todayIso: "2026-12-01" }));
        expect(row.components.margin).toBe(scoreMargins(row.evaluation.checks));
        expect(row.components.dataQuality).toBe(scoreDataQuality(row.evaluation.dataQuality.score, row.evaluation.flags));
        expect(row.evaluation).toBe(row.evaluation);
      }
      for (const row of ranking.failing.slice(0, 30)) {
        expect([...row.flags].sort()).toEqual([...row.evaluation.flags].sort());
        expect(row.reasons.length).toBeGreaterThan(0);
      }
    }
  });
});

describe("score helpers", () => {
  it("give the same numbers as the forms that take objects", () => {
    expect(scoreLeastMargin(null)).toBe(1);
    expect(scoreLeastMargin(0.1)).toBeCloseTo(0.2, 12);
    expect(scoreRecordQuality(1, true)).toBe(0.75);
    const weights = { margin: 35, cost: 25, stock: 20, lifecycle: 10, dataQuality: 10 };
    expect(combineScoreParts(0.5, 1, 0.2, 1, 0.75, weights)).toBe(combineScore({ margin: 0.5, cost: 1, stock: 0.2, lifecycle: 1, dataQuality: 0.75 }, weights));
  });
});

describe("screenCompound", () => {
  it("judges a pair as evaluateCompound does, and explains it the same", () => {
    const npn = catalogue.filter((e) => e.part.polarity === "npn").slice(0, 12);
    for (const id of ["linear-pass", "motor-switch"]) {
      const sheet = presets.find((p) => p.id === id)?.sheet ?? sheets[0];
      for (const driver of npn) {
        for (const output of npn.slice(0, 4)) {
          const screen = screenCompound("darlington", driver.part, output.part, sheet, { bleedOhms: 220 });
          const evaluation = evaluateCompound("darlington", driver.part, output.part, sheet, { bleedOhms: 220 });
          expect(screen.verdict).toBe(evaluation.verdict);
          expect(screen.flags).toBe(maskOfFlags(evaluation.flags));
          expect(explainCompound(screen)).toEqual(evaluation);
        }
      }
    }
    expect(vceSatAt([], 1)).toBeNull();
  });
});
