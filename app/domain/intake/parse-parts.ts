// Parses and validates a parts intake file into catalogue part specs, with every problem found.
import { partKey, type PartSpec } from "../part";
import type { CellValue } from "./cells";
import { groupColumnName, INTAKE_FORMATS } from "./columns";
import { asHfeValue, HFE_ROLE_LABELS, HFE_ROLES, type HfeRole, type HfeValue } from "./hfe-notation";
import { PartSpecSchema } from "./part-schema";
import { warnAboutPart } from "./plausibility";
import type { IntakeParseResult } from "./problems";
import { readTable } from "./read-table";
import { validateRows, type RawPoint, type RawRow, type RowReport } from "./validate-rows";

export type PartsParseResult = IntakeParseResult<"parts", PartSpec>;

export interface ParseOptions {
  /** Today's date (YYYY-MM-DD), for the future-date warnings; left out, they are skipped. */
  todayIso?: string;
}

const GAIN = INTAKE_FORMATS.parts.groups.find((g) => g.prefix === "gain")!;

/** Reads an uploaded parts file (bytes as uploaded) into validated part specs and problems. */
export function parsePartsFile(bytes: Uint8Array, options: ParseOptions = {}): PartsParseResult {
  const format = INTAKE_FORMATS.parts;
  return validateRows<"parts", PartSpec>(readTable(bytes, format), format, {
    assemble: assemblePart,
    schema: PartSpecSchema,
    identify: identifyPart,
    duplicateColumn: "part_number",
    duplicateMessage: (firstRow) => `the same part as row ${firstRow} (manufacturer and part number match)`,
    warn: (spec, columnOf) => warnAboutPart(spec, columnOf, options.todayIso),
  });
}

function assemblePart(raw: RawRow, report: RowReport): unknown {
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
    gainPoints: raw.points.gainPoints.map((p) => assembleGainPoint(p, report)),
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

const HFE_SOURCES: ReadonlyArray<["hfe" | HfeRole, HfeRole | null]> = [
  ["hfe", null],
  ["hfeMin", "hfeMin"],
  ["hfeTyp", "hfeTyp"],
  ["hfeMax", "hfeMax"],
];

const isHfe = (value: CellValue): value is HfeValue | number => typeof value === "number" || (value !== null && typeof value === "object" && value.kind === "hfe");

// hFE may come from the `hfe` column ("100-300") and from hfe_min, hfe_typ, hfe_max; each value must be said once.
function assembleGainPoint(point: RawPoint, report: RowReport): Record<string, unknown> {
  const v = point.values;
  const plain = (value: CellValue | undefined) => value === undefined || value === null || typeof value === "number";
  // The usual row: plain numbers in the three columns, no `hfe` column; nothing to merge.
  if ((v.hfe === undefined || v.hfe === null) && plain(v.hfeMin) && plain(v.hfeTyp) && plain(v.hfeMax)) {
    return { icAmps: v.icAmps, vceVolts: v.vceVolts, hfeMin: v.hfeMin ?? null, hfeTyp: v.hfeTyp ?? null, hfeMax: v.hfeMax ?? null, tempC: v.tempC };
  }
  const merged: Record<HfeRole, number | null> = { hfeMin: null, hfeTyp: null, hfeMax: null };
  const from: Partial<Record<HfeRole, string>> = {};
  for (const [field, role] of HFE_SOURCES) {
    const cell = v[field];
    if (cell === undefined || !isHfe(cell)) continue;
    const stated = typeof cell === "number" && role === null ? null : asHfeValue(cell, role ?? "hfeMin");
    if (!stated) continue;
    const column = groupColumnName(GAIN, point.pointNumber, GAIN.columns.find((c) => c.field === field)!);
    for (const statedRole of HFE_ROLES) {
      const value = stated[statedRole];
      if (value === null) continue;
      const earlier = merged[statedRole];
      if (earlier !== null && earlier !== value) {
        report.problem(column, `gain point ${point.pointNumber}: ${HFE_ROLE_LABELS[statedRole]} is given twice (${earlier} in ${from[statedRole]}, ${value} here)`);
        continue;
      }
      merged[statedRole] = value;
      from[statedRole] ??= column;
    }
  }
  return { icAmps: v.icAmps, vceVolts: v.vceVolts, ...merged, tempC: v.tempC };
}

function identifyPart(raw: RawRow): string | null {
  const { manufacturer, partNumber } = raw.fields;
  return typeof manufacturer === "string" && typeof partNumber === "string" ? partKey(manufacturer, partNumber) : null;
}
