// The requirement sheet: what the circuit needs, in SI base units, and the presets that start one.
import { z } from "zod";
import { DEFAULT_DERATING, DERATING_POLICIES, DeratingPolicySchema } from "./derating";

export const MODES = ["linear", "switching"] as const;
export type Mode = (typeof MODES)[number];

export const SHEET_POLARITIES = ["npn", "pnp", "any"] as const;
export type SheetPolarity = (typeof SHEET_POLARITIES)[number];

/** Forced gain IC / IB for hard saturation when switching (common practice). */
export const DEFAULT_FORCED_GAIN = 10;

const positive = z.number().finite().gt(0);
const nonNegative = z.number().finite().min(0);

export const DriveSchema = z
  .discriminatedUnion("kind", [
    // sourceOhms is the whole series resistance in the base path as drawn (source output plus any base resistor).
    z.object({ kind: z.literal("source"), volts: positive, sourceOhms: positive }),
    z.object({ kind: z.literal("current"), ibAmps: positive }),
  ])
  .nullable();
export type Drive = z.infer<typeof DriveSchema>;

export const RequirementSheetSchema = z
  .object({
    name: z.string().default("Untitled sheet"),
    supplyVolts: positive,
    /** Peak collector-emitter voltage including any unclamped inductive kick; null means the supply. */
    peakVceVolts: positive.nullable().default(null),
    /** Reverse base-emitter voltage the drive applies when off, checked against VEBO; null when none. */
    reverseVbeVolts: positive.nullable().default(null),
    operatingIcAmps: positive,
    /** null means the operating current. */
    peakIcAmps: positive.nullable().default(null),
    /** Lowest collector current the circuit runs at; null means the operating current. */
    minIcAmps: positive.nullable().default(null),
    mode: z.enum(MODES),
    /** Fraction of time the switch conducts; ignored in linear mode. */
    dutyCycle: z.number().gt(0).max(1).default(1),
    /** VCE at the operating point in linear mode; null means half the supply (class-A bias, common practice). */
    vceOperatingVolts: positive.nullable().default(null),
    ambientC: z.number().finite().min(-55).max(200).default(25),
    /** Case-to-ambient thermal resistance of the heatsink, interface included; null = no heatsink. */
    heatsinkRthCPerW: positive.nullable().default(null),
    drive: DriveSchema.default(null),
    requiredHfe: positive.nullable().default(null),
    requiredVoltageGain: positive.nullable().default(null),
    /** Collector load resistance RC for the voltage gain check. */
    loadOhms: positive.nullable().default(null),
    bandwidthHz: positive.nullable().default(null),
    allowedSatDropVolts: positive.nullable().default(null),
    forcedGain: positive.default(DEFAULT_FORCED_GAIN),
    polarity: z.enum(SHEET_POLARITIES).default("any"),
    /** Allowed package outlines; empty means any. */
    packages: z.array(z.string().min(1)).default([]),
    derating: DeratingPolicySchema.default(DEFAULT_DERATING),
    compounds: z.boolean().default(false),
    orderQuantity: z.number().int().min(1).default(1),
  })
  .refine((sheet) => sheet.peakVceVolts == null || sheet.peakVceVolts >= sheet.supplyVolts * 0.999, {
    message: "Peak VCE cannot be below the supply",
    path: ["peakVceVolts"],
  })
  .refine((sheet) => sheet.peakIcAmps == null || sheet.peakIcAmps >= sheet.operatingIcAmps, {
    message: "Peak IC cannot be below the operating IC",
    path: ["peakIcAmps"],
  })
  .refine((sheet) => sheet.minIcAmps == null || sheet.minIcAmps <= sheet.operatingIcAmps, {
    message: "Lowest IC cannot be above the operating IC",
    path: ["minIcAmps"],
  })
  .refine((sheet) => sheet.vceOperatingVolts == null || sheet.vceOperatingVolts <= sheet.supplyVolts, {
    message: "VCE at the operating point cannot exceed the supply",
    path: ["vceOperatingVolts"],
  });

export type RequirementSheet = z.output<typeof RequirementSheetSchema>;
export type RequirementSheetInput = z.input<typeof RequirementSheetSchema>;

/** Parses and fills the defaults of a sheet; throws a ZodError naming each bad field. */
export function parseRequirementSheet(input: unknown): RequirementSheet {
  return RequirementSheetSchema.parse(input);
}

/** The peak VCE the device must stand: the stated peak, or the supply. */
export function peakVceOf(sheet: RequirementSheet): number {
  return sheet.peakVceVolts ?? sheet.supplyVolts;
}

export function peakIcOf(sheet: RequirementSheet): number {
  return sheet.peakIcAmps ?? sheet.operatingIcAmps;
}

export function minIcOf(sheet: RequirementSheet): number {
  return sheet.minIcAmps ?? sheet.operatingIcAmps;
}

/** VCE at the operating point in linear mode. */
export function operatingVceOf(sheet: RequirementSheet): number {
  return sheet.vceOperatingVolts ?? sheet.supplyVolts / 2;
}

export interface RequirementPreset {
  id: string;
  name: string;
  description: string;
  sheet: RequirementSheet;
}

const industrial = DERATING_POLICIES.find((policy) => policy.id === "industrial") ?? DEFAULT_DERATING;

export const presets: readonly RequirementPreset[] = [
  {
    id: "audio-preamp",
    name: "Small-signal audio preamp stage",
    description: "Common-emitter stage at 1 mA from 24 V, gain 100 into 10 kΩ, 20 kHz.",
    sheet: parseRequirementSheet({
      name: "Audio preamp stage",
      supplyVolts: 24,
      operatingIcAmps: 1e-3,
      minIcAmps: 0.5e-3,
      peakIcAmps: 2e-3,
      mode: "linear",
      vceOperatingVolts: 12,
      ambientC: 40,
      requiredHfe: 100,
      requiredVoltageGain: 100,
      loadOhms: 10e3,
      bandwidthHz: 20e3,
      polarity: "npn",
      derating: industrial,
      orderQuantity: 1000,
    }),
  },
  {
    id: "low-side-switch",
    name: "LED or relay low-side switch",
    description: "150 mA from 12 V, driven by a 3.3 V logic output through a 150 Ω base resistor, clamped coil.",
    sheet: parseRequirementSheet({
      name: "Low-side switch",
      supplyVolts: 12,
      peakVceVolts: 13,
      operatingIcAmps: 0.15,
      mode: "switching",
      dutyCycle: 1,
      ambientC: 50,
      // A start that can work: 150 Ω gives a 3.3 V pin about 16 mA of base current for a forced gain of 10.
      drive: { kind: "source", volts: 3.3, sourceOhms: 150 },
      allowedSatDropVolts: 0.4,
      polarity: "npn",
      derating: industrial,
      orderQuantity: 2500,
    }),
  },
  {
    id: "motor-switch",
    name: "Motor driver switch",
    description: "2 A DC motor from 24 V, 3 A start, 50% PWM, on a heatsink.",
    sheet: parseRequirementSheet({
      name: "Motor driver switch",
      supplyVolts: 24,
      peakVceVolts: 30,
      operatingIcAmps: 2,
      peakIcAmps: 3,
      mode: "switching",
      dutyCycle: 0.5,
      ambientC: 50,
      heatsinkRthCPerW: 5,
      drive: { kind: "current", ibAmps: 0.3 },
      allowedSatDropVolts: 1,
      polarity: "npn",
      derating: industrial,
      compounds: true,
      orderQuantity: 500,
    }),
  },
  {
    id: "linear-pass",
    name: "Linear pass stage",
    description: "Series pass element dropping 5 V at 1 A from 15 V, on a heatsink.",
    sheet: parseRequirementSheet({
      name: "Linear pass stage",
      supplyVolts: 15,
      operatingIcAmps: 1,
      minIcAmps: 0.01,
      peakIcAmps: 1.5,
      mode: "linear",
      vceOperatingVolts: 5,
      ambientC: 40,
      heatsinkRthCPerW: 3,
      requiredHfe: 1000,
      polarity: "npn",
      derating: industrial,
      compounds: true,
      orderQuantity: 200,
    }),
  },
];
