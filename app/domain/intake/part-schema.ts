// The rules a part must meet to enter the catalogue, as one zod schema (intake rows and the edit form).
import { z } from "zod";
import { formatQuantity } from "../quantity";
import { CONFIGURATIONS, LIFECYCLES, POLARITIES, PTOT_REFERENCES, type GainPoint, type PartSpec, type SaturationPoint } from "../part";
import { INTAKE_FORMATS } from "./columns";
import { columnNamed, optionalNumber, optionalText, requiredChoice, requiredNumber, requiredText } from "./schema-fields";

const PARTS = INTAKE_FORMATS.parts;
const part = (name: string) => columnNamed(PARTS, name);
const gain = (name: string) => columnNamed(PARTS, name, "gain");
const sat = (name: string) => columnNamed(PARTS, name, "sat");
const POINT_NEEDS_IC = "IC is required (the point has other values)";

// Cross-field rules also run when another field is missing, so one upload reports every problem;
// they therefore read their inputs defensively.
const RUN_ALWAYS = { when: () => true };

function numberOrNull(value: unknown): number | null {
  return typeof value === "number" ? value : null;
}

export const GainPointSchema: z.ZodType<GainPoint> = z
  .object({
    icAmps: requiredNumber(gain("ic"), POINT_NEEDS_IC),
    vceVolts: optionalNumber(gain("vce")),
    hfeMin: optionalNumber(gain("hfe_min")),
    hfeTyp: optionalNumber(gain("hfe_typ")),
    hfeMax: optionalNumber(gain("hfe_max")),
    tempC: optionalNumber(gain("temp")),
  })
  .superRefine((point, ctx) => {
    const [min, typ, max] = [numberOrNull(point.hfeMin), numberOrNull(point.hfeTyp), numberOrNull(point.hfeMax)];
    if (min === null && typ === null && max === null) {
      ctx.addIssue({ code: "custom", path: ["hfeMin"], message: "give at least one of hFE min, typ or max" });
    }
    if (min !== null && max !== null && min > max) {
      ctx.addIssue({ code: "custom", path: ["hfeMin"], message: `hFE min (${min}) is above hFE max (${max})` });
    }
    if (typ !== null && min !== null && typ < min) {
      ctx.addIssue({ code: "custom", path: ["hfeTyp"], message: `hFE typ (${typ}) is below hFE min (${min})` });
    }
    if (typ !== null && max !== null && typ > max) {
      ctx.addIssue({ code: "custom", path: ["hfeTyp"], message: `hFE typ (${typ}) is above hFE max (${max})` });
    }
  }, RUN_ALWAYS);

export const SaturationPointSchema: z.ZodType<SaturationPoint> = z
  .object({
    icAmps: requiredNumber(sat("ic"), POINT_NEEDS_IC),
    ibAmps: optionalNumber(sat("ib")),
    vceSatMaxVolts: optionalNumber(sat("vce_max")),
    vceSatTypVolts: optionalNumber(sat("vce_typ")),
    vbeSatVolts: optionalNumber(sat("vbe")),
  })
  .superRefine((point, ctx) => {
    const [max, typ] = [numberOrNull(point.vceSatMaxVolts), numberOrNull(point.vceSatTypVolts)];
    if (max !== null && typ !== null && typ > max) {
      const show = (v: number) => formatQuantity(v, "voltage", { digits: 6 });
      ctx.addIssue({ code: "custom", path: ["vceSatTypVolts"], message: `VCE(sat) typ (${show(typ)}) is above VCE(sat) max (${show(max)})` });
    }
  }, RUN_ALWAYS);

export const PartSpecSchema: z.ZodType<PartSpec> = z
  .object({
    manufacturer: requiredText(part("manufacturer")),
    partNumber: requiredText(part("part_number")),
    polarity: requiredChoice(part("polarity"), POLARITIES),
    packageName: requiredText(part("package")),
    configuration: requiredChoice(part("configuration"), CONFIGURATIONS),
    vceoVolts: requiredNumber(part("vceo")),
    vcboVolts: optionalNumber(part("vcbo")),
    veboVolts: optionalNumber(part("vebo")),
    icMaxAmps: requiredNumber(part("ic_max")),
    ptotWatts: optionalNumber(part("ptot")),
    ptotReference: z.enum(PTOT_REFERENCES).nullable(),
    tjMaxC: optionalNumber(part("tj_max")),
    rthJaCPerW: optionalNumber(part("rth_ja")),
    rthJcCPerW: optionalNumber(part("rth_jc")),
    gainPoints: z.array(GainPointSchema).min(1, { error: "a part needs at least one gain point (an IC with hFE min, typ or max)" }),
    saturationPoints: z.array(SaturationPointSchema),
    vbeOnVolts: optionalNumber(part("vbe_on")),
    ftHz: optionalNumber(part("ft")),
    cobFarads: optionalNumber(part("cob")),
    earlyVolts: optionalNumber(part("early_voltage")),
    lifecycle: requiredChoice(part("lifecycle"), LIFECYCLES),
    datasheetUrl: optionalText(),
    datasheetRevisionDate: optionalText(),
  })
  .superRefine((spec, ctx) => {
    if (numberOrNull(spec.ptotWatts) !== null && (spec.ptotReference ?? null) === null) {
      ctx.addIssue({ code: "custom", path: ["ptotReference"], message: "Ptot reference (ambient or case) is required when Ptot is given" });
    }
  }, RUN_ALWAYS);
