// Parses and validates a parts intake file into catalogue part specs, with every problem found.
import { partKey, type PartSpec } from "../part";
import { INTAKE_FORMATS } from "./columns";
import { PartSpecSchema } from "./part-schema";
import type { IntakeParseResult } from "./problems";
import { readTable } from "./read-table";
import { validateRows, type RawRow } from "./validate-rows";

export type PartsParseResult = IntakeParseResult<"parts", PartSpec>;

/** Reads an uploaded parts file (bytes as uploaded) into validated part specs and problems. */
export function parsePartsFile(bytes: Uint8Array): PartsParseResult {
  const format = INTAKE_FORMATS.parts;
  return validateRows<"parts", PartSpec>(readTable(bytes, format), format, {
    assemble: assemblePart,
    schema: PartSpecSchema,
    identify: identifyPart,
    duplicateColumn: "part_number",
    duplicateMessage: (firstRow) => `the same part as row ${firstRow} (manufacturer and part number match)`,
  });
}

function assemblePart(raw: RawRow): unknown {
  const f = raw.fields;
  return {
    manufacturer: f.manufacturer ?? undefined,
    partNumber: f.partNumber ?? undefined,
    polarity: f.polarity ?? undefined,
    packageName: f.packageName ?? undefined,
    configuration: f.configuration ?? "single",
    vceoVolts: f.vceoVolts ?? undefined,
    vcboVolts: f.vcboVolts ?? null,
    veboVolts: f.veboVolts ?? null,
    icMaxAmps: f.icMaxAmps ?? undefined,
    ptotWatts: f.ptotWatts ?? null,
    ptotReference: f.ptotReference ?? null,
    tjMaxC: f.tjMaxC ?? null,
    rthJaCPerW: f.rthJaCPerW ?? null,
    rthJcCPerW: f.rthJcCPerW ?? null,
    gainPoints: raw.points.gainPoints.map((p) => p.values),
    saturationPoints: raw.points.saturationPoints.map((p) => p.values),
    vbeOnVolts: f.vbeOnVolts ?? null,
    ftHz: f.ftHz ?? null,
    cobFarads: f.cobFarads ?? null,
    earlyVolts: f.earlyVolts ?? null,
    lifecycle: f.lifecycle ?? "active",
    datasheetUrl: f.datasheetUrl ?? null,
    datasheetRevisionDate: f.datasheetRevisionDate ?? null,
  };
}

function identifyPart(raw: RawRow): string | null {
  const { manufacturer, partNumber } = raw.fields;
  return typeof manufacturer === "string" && typeof partNumber === "string" ? partKey(manufacturer, partNumber) : null;
}
