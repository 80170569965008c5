import { describe, expect, it } from "vitest";
import { formatPercent, formatValue } from "./format";

describe("formatValue", () => {
  it("prints engineering notation with the unit", () => {
    expect(formatValue(0.00025, "A")).toBe("250 µA");
    expect(formatValue(4700, "Ω")).toBe("4.7 kΩ");
    expect(formatValue(12, "V")).toBe("12 V");
    expect(formatValue(-0.2, "V")).toBe("-200 mV");
    expect(formatValue(250e6, "Hz")).toBe("250 MHz");
  });
  it("prints temperatures and plain ratios without prefixes", () => {
    expect(formatValue(125.46, "°C")).toBe("125 °C");
    expect(formatValue(62.5, "°C/W")).toBe("62.5 °C/W");
    expect(formatValue(350, "")).toBe("350");
    expect(formatValue(Number.POSITIVE_INFINITY, "A")).toBe("∞ A");
  });
});

describe("formatPercent", () => {
  it("rounds to a whole percentage", () => {
    expect(formatPercent(0.234)).toBe("23%");
    expect(formatPercent(0.8)).toBe("80%");
  });
});
