import { describe, expect, it } from "vitest";
import { demoParts } from "#seeds/data/parts.ts";
import type { PartSpec } from "#app/domain/part.ts";
import { partToFormValues, readPartForm, type PartFormValues } from "./part-form-fields.ts";

function formDataOf(values: PartFormValues): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(values.fields)) form.append(name, value);
  for (const [group, rows] of [["gainPoints", values.gainPoints], ["saturationPoints", values.saturationPoints]] as const) {
    for (const row of rows) for (const [field, value] of Object.entries(row)) form.append(`${group}.${field}`, value);
  }
  return form;
}

describe("part correction form", () => {
  it("reads back every demo part exactly from the text it shows (values with units)", () => {
    for (const part of demoParts) {
      const result = readPartForm(formDataOf(partToFormValues(part)));
      expect(result.ok ? result.spec : result.fieldErrors, part.partNumber).toEqual(part);
    }
  });

  it("shows values with their units", () => {
    const values = partToFormValues(demoParts[0]!);
    expect(values.fields.vceoVolts).toMatch(/ V$/);
    expect(values.fields.icMaxAmps).toMatch(/ (m|µ)?A$/);
    expect(values.fields.polarity).toMatch(/^(NPN|PNP)$/);
    expect(values.gainPoints[0]!.icAmps).toMatch(/A$/);
  });

  it("keys each problem by its input, the cell rules and the schema's rules alike", () => {
    const values = partToFormValues(demoParts[0]!);
    values.fields.icMaxAmps = "45 V";
    values.fields.vceoVolts = "";
    values.gainPoints[0] = { ...values.gainPoints[0]!, hfeMin: "450", hfeMax: "200", hfeTyp: "" };
    const result = readPartForm(formDataOf(values));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.fieldErrors.icMaxAmps).toBe("a voltage (V) where a current is expected");
    expect(result.fieldErrors.vceoVolts).toBe("VCEO is required");
    expect(result.fieldErrors["gainPoints.0.hfeMin"]).toBe("hFE min (450) is above hFE max (200)");
    // The values come back as typed, so nothing the librarian wrote is lost.
    expect(result.values.fields.icMaxAmps).toBe("45 V");
  });

  it("drops wholly blank point rows and reads added ones, in any spelling of micro", () => {
    const base = demoParts[0]!;
    const values = partToFormValues(base);
    values.gainPoints.push({ icAmps: "", vceVolts: "", hfeMin: "", hfeTyp: "", hfeMax: "", tempC: "" });
    values.gainPoints.push({ icAmps: "10uA", vceVolts: "5 V", hfeMin: "", hfeTyp: "180", hfeMax: "", tempC: "" });
    const result = readPartForm(formDataOf(values));
    expect(result.ok).toBe(true);
    const spec = result.ok ? result.spec : ({} as PartSpec);
    expect(spec.gainPoints).toHaveLength(base.gainPoints.length + 1);
    expect(spec.gainPoints.at(-1)).toEqual({ icAmps: 10e-6, vceVolts: 5, hfeMin: null, hfeTyp: 180, hfeMax: null, tempC: null });
  });

  it("refuses a part without any gain point", () => {
    const values = partToFormValues(demoParts[0]!);
    values.gainPoints = [];
    const result = readPartForm(formDataOf(values));
    expect(result.ok ? null : result.fieldErrors.gainPoints).toBe("a part needs at least one gain point (an IC with hFE min, typ or max)");
  });
});
