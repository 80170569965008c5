// A seeded generator of invented parts with offers, for the engine bench and the search's property tests.
import type { CatalogueEntry } from "#app/domain/rank.ts";
import type { GainPoint, Lifecycle, Offer, PartSpec, Polarity, PriceBreak, SaturationPoint } from "#app/domain/part.ts";

/** Invented makers and suppliers; none is a real company. */
const MAKERS = [
  { name: "Quillon Semiconductor", prefix: "QL" },
  { name: "Ardent Devices", prefix: "AD" },
  { name: "Meridel Micro", prefix: "MR" },
  { name: "Tessaly Electronics", prefix: "TS" },
] as const;
const SUPPLIERS = ["Northwind Components", "Calder Parts", "Brightwater Supply"] as const;

type DeviceClass = "small" | "medium" | "power" | "darlington";

/** mulberry32: a tiny, well-known 32-bit generator; the same seed gives the same catalogue everywhere. */
export function createRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Draw {
  between: (low: number, high: number) => number;
  logBetween: (low: number, high: number) => number;
  pick: <T>(items: readonly T[]) => T;
  chance: (p: number) => boolean;
}

function drawFrom(random: () => number): Draw {
  return {
    between: (low, high) => low + (high - low) * random(),
    logBetween: (low, high) => low * (high / low) ** random(),
    pick: (items) => items[Math.floor(random() * items.length)],
    chance: (p) => random() < p,
  };
}

function round(value: number, digits: number): number {
  return Number(value.toPrecision(digits));
}

function chooseClass(draw: Draw): DeviceClass {
  const r = draw.between(0, 1);
  if (r < 0.4) return "small";
  if (r < 0.65) return "medium";
  if (r < 0.95) return "power";
  return "darlington";
}

interface ClassShape {
  packages: readonly string[];
  vceo: [number, number];
  icMax: [number, number];
  /** Gain points as fractions of IC max; the last one rolls off. */
  gainAt: readonly number[];
  hfeMin: [number, number];
  ptot: [number, number];
  ptotReference: "ambient" | "case";
  rthJc: [number, number] | null;
  rthJa: [number, number];
  ft: [number, number];
  price: [number, number];
}

const SHAPES: Record<DeviceClass, ClassShape> = {
  small: { packages: ["TO-92", "SOT-23"], vceo: [25, 80], icMax: [0.1, 0.8], gainAt: [0.0002, 0.002, 0.02, 0.2], hfeMin: [60, 400], ptot: [0.25, 0.625], ptotReference: "ambient", rthJc: null, rthJa: [200, 420], ft: [1e8, 4e8], price: [0.02, 0.3] },
  medium: { packages: ["SOT-89", "SOT-223", "TO-126"], vceo: [40, 100], icMax: [1, 2], gainAt: [0.005, 0.05, 0.3, 0.8], hfeMin: [40, 250], ptot: [1, 12], ptotReference: "case", rthJc: [10, 60], rthJa: [60, 150], ft: [5e7, 2e8], price: [0.1, 0.8] },
  power: { packages: ["TO-220", "TO-247", "DPAK"], vceo: [40, 250], icMax: [3, 15], gainAt: [0.01, 0.1, 0.4, 0.9], hfeMin: [15, 100], ptot: [40, 150], ptotReference: "case", rthJc: [0.8, 3], rthJa: [35, 70], ft: [2e6, 3e7], price: [0.3, 4] },
  darlington: { packages: ["TO-220", "TO-247"], vceo: [60, 120], icMax: [5, 10], gainAt: [0.05, 0.3, 0.8], hfeMin: [750, 2500], ptot: [60, 125], ptotReference: "case", rthJc: [1, 2], rthJa: [50, 70], ft: [1e6, 5e6], price: [0.5, 3] },
};

function makeGainPoints(shape: ClassShape, icMax: number, draw: Draw, onlyTyp: boolean): GainPoint[] {
  const peak = draw.between(shape.hfeMin[0], shape.hfeMin[1]);
  const count = draw.chance(0.3) ? 2 : shape.gainAt.length;
  const start = shape.gainAt.length - count;
  // Common practice: gain is lower at small currents and rolls off at high current.
  const profile = [0.7, 1, 0.9, 0.45];
  return shape.gainAt.slice(start).map((fraction, i) => {
    const hfeMin = round(peak * profile[(i + start) % profile.length], 3);
    return {
      icAmps: round(icMax * fraction, 3),
      vceVolts: draw.pick([1, 2, 5, 10]),
      hfeMin: onlyTyp ? null : hfeMin,
      hfeTyp: round(hfeMin * 1.7, 3),
      hfeMax: onlyTyp || draw.chance(0.4) ? null : round(hfeMin * 3, 3),
      tempC: 25,
    };
  });
}

function makeSaturationPoints(icMax: number, darlington: boolean, draw: Draw): SaturationPoint[] {
  const forced = darlington ? 250 : 10;
  const base = darlington ? draw.between(0.8, 1.2) : draw.between(0.08, 0.3);
  return [0.1, 0.5].map((fraction, i) => ({
    icAmps: round(icMax * fraction, 3),
    ibAmps: round((icMax * fraction) / forced, 3),
    vceSatMaxVolts: round(base * (i === 0 ? 1 : 2.2), 3),
    vceSatTypVolts: null,
    vbeSatVolts: round(darlington ? 1.8 + 0.3 * i : 0.85 + 0.2 * i, 3),
  }));
}

function makeOffers(basePrice: number, draw: Draw): Offer[] {
  if (draw.chance(0.05)) return [];
  const count = 1 + Math.floor(draw.between(0, 3));
  const offers: Offer[] = [];
  for (let i = 0; i < count; i += 1) {
    const minimumOrder = draw.pick([1, 1, 10, 100, 1000]);
    const unit = basePrice * draw.between(0.8, 1.4);
    const breaks: PriceBreak[] = [1, 10, 100, 1000, 10000]
      .filter((quantity) => quantity >= minimumOrder || quantity === 10000)
      .map((quantity, j) => ({ quantity: Math.max(quantity, minimumOrder), unitPrice: round(unit * 0.82 ** j, 4) }));
    offers.push({
      supplier: SUPPLIERS[i % SUPPLIERS.length],
      supplierSku: `${SUPPLIERS[i % SUPPLIERS.length].slice(0, 2).toUpperCase()}-${Math.floor(draw.between(10000, 99999))}`,
      stock: draw.chance(0.15) ? 0 : Math.floor(draw.logBetween(10, 50000)),
      minimumOrder,
      orderMultiple: draw.chance(0.3) ? minimumOrder : 1,
      priceBreaks: breaks,
      currency: "EUR",
      leadTimeDays: draw.chance(0.5) ? Math.floor(draw.between(5, 90)) : null,
      asOf: "2026-11-30",
    });
  }
  return offers;
}

function chooseLifecycle(draw: Draw): Lifecycle {
  const r = draw.between(0, 1);
  return r < 0.8 ? "active" : r < 0.9 ? "nrnd" : r < 0.95 ? "last-time-buy" : "obsolete";
}

/** One invented part of a random class, polarity and data completeness. */
function makePart(index: number, draw: Draw): PartSpec {
  const kind = chooseClass(draw);
  const shape = SHAPES[kind];
  const maker = MAKERS[index % MAKERS.length];
  const polarity: Polarity = draw.chance(0.55) ? "npn" : "pnp";
  const icMax = round(draw.between(shape.icMax[0], shape.icMax[1]), 2);
  const tjMax = draw.pick([150, 150, 175]);
  return {
    manufacturer: maker.name,
    partNumber: `${maker.prefix}-${kind[0].toUpperCase()}${String(index).padStart(6, "0")}${polarity === "npn" ? "N" : "P"}`,
    polarity,
    packageName: draw.pick(shape.packages),
    configuration: kind === "darlington" ? "darlington" : "single",
    vceoVolts: Math.round(draw.between(shape.vceo[0], shape.vceo[1])),
    vcboVolts: null,
    veboVolts: draw.pick([5, 6, 7]),
    icMaxAmps: icMax,
    ptotWatts: round(draw.between(shape.ptot[0], shape.ptot[1]), 3),
    ptotReference: shape.ptotReference,
    tjMaxC: tjMax,
    rthJaCPerW: round(draw.between(shape.rthJa[0], shape.rthJa[1]), 3),
    rthJcCPerW: shape.rthJc ? round(draw.between(shape.rthJc[0], shape.rthJc[1]), 3) : null,
    gainPoints: makeGainPoints(shape, icMax, draw, draw.chance(0.15)),
    saturationPoints: makeSaturationPoints(icMax, kind === "darlington", draw),
    vbeOnVolts: draw.chance(0.7) ? round(kind === "darlington" ? draw.between(1.3, 1.6) : draw.between(0.6, 0.78), 3) : null,
    ftHz: draw.chance(0.85) ? round(draw.logBetween(shape.ft[0], shape.ft[1]), 3) : null,
    cobFarads: null,
    earlyVolts: draw.chance(0.7) ? Math.round(draw.between(30, 200)) : null,
    lifecycle: chooseLifecycle(draw),
    datasheetUrl: null,
    datasheetRevisionDate: `${2008 + Math.floor(draw.between(0, 18))}-0${1 + Math.floor(draw.between(0, 9))}-15`,
  };
}

/** N invented parts with 0-3 offers each; the same (count, seed) always gives the same catalogue. */
export function generateParts(count: number, seed = 1): CatalogueEntry[] {
  const draw = drawFrom(createRandom(seed));
  const entries: CatalogueEntry[] = [];
  for (let i = 0; i < count; i += 1) {
    const part = makePart(i, draw);
    const shape = SHAPES[part.configuration === "darlington" ? "darlington" : classOf(part)];
    entries.push({ part, offers: makeOffers(draw.between(shape.price[0], shape.price[1]), draw) });
  }
  return entries;
}

function classOf(part: PartSpec): DeviceClass {
  if (part.icMaxAmps <= 0.8) return "small";
  if (part.icMaxAmps <= 2) return "medium";
  return "power";
}
