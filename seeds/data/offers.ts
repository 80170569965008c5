// Invented supplier offers for the demo catalogue: three fictional suppliers, prices as of late 2026.
import type { Offer, PriceBreak } from "#app/domain/part.ts";
import { demoManufacturers } from "./manufacturers.ts";

export interface DemoSupplier {
  name: string;
  currency: "EUR" | "USD";
  asOf: string;
  buildSku: (partNumber: string) => string | null;
}

export const LARKSPUR = "Larkspur Component Supply";
export const ONDRELL = "Ondrell Electronics";
export const HIGHMOOR = "Highmoor Parts Exchange";

export const demoSuppliers: DemoSupplier[] = [
  { name: LARKSPUR, currency: "EUR", asOf: "2026-11-28", buildSku: (partNumber) => `LCS-${partNumber}` },
  { name: ONDRELL, currency: "USD", asOf: "2026-11-30", buildSku: (partNumber) => `ON${partNumber.replace(/-/g, "")}` },
  // A broker of older and scarce stock: no SKUs of its own.
  { name: HIGHMOOR, currency: "EUR", asOf: "2026-10-19", buildSku: () => null },
];

/** How a supplier packs a part, which fixes its minimum order, order multiple and break quantities. */
type Packing = "loose" | "broker" | "reel3000" | "reel1000" | "tube50" | "tray";

interface PackingTerms {
  minimumOrder: number;
  orderMultiple: number;
  /** Break quantities and each one's price as a fraction of the first break's. */
  breaks: Array<[quantity: number, priceFactor: number]>;
}

const PACKING_TERMS: Record<Packing, PackingTerms> = {
  loose: {
    minimumOrder: 1,
    orderMultiple: 1,
    breaks: [
      [1, 1],
      [10, 0.8],
      [100, 0.55],
      [1000, 0.38],
      [5000, 0.3],
    ],
  },
  broker: {
    minimumOrder: 1,
    orderMultiple: 1,
    breaks: [
      [1, 1],
      [10, 0.9],
      [100, 0.8],
    ],
  },
  reel3000: {
    minimumOrder: 3000,
    orderMultiple: 3000,
    breaks: [
      [3000, 1],
      [15000, 0.85],
      [30000, 0.75],
    ],
  },
  reel1000: {
    minimumOrder: 1000,
    orderMultiple: 1000,
    breaks: [
      [1000, 1],
      [5000, 0.85],
    ],
  },
  tube50: {
    minimumOrder: 50,
    orderMultiple: 50,
    breaks: [
      [50, 1],
      [250, 0.85],
      [1000, 0.72],
    ],
  },
  tray: {
    minimumOrder: 1,
    orderMultiple: 1,
    breaks: [
      [1, 1],
      [10, 0.85],
      [100, 0.7],
    ],
  },
};

// partNumber, supplier, stock, unit price at the first break, lead time in days, packing.
type OfferRow = [partNumber: string, supplier: string, stock: number, firstPrice: number, leadDays: number, packing: Packing];

const L = LARKSPUR;
const O = ONDRELL;
const H = HIGHMOOR;

const OFFER_ROWS: OfferRow[] = [
  ["OSK2710N", L, 26000, 0.12, 3, "loose"],
  ["OSK2710N", O, 7400, 0.14, 2, "loose"],
  ["OSK2710P", L, 19800, 0.13, 3, "loose"],
  ["OSK2710P", O, 4900, 0.15, 2, "loose"],
  ["OSK2730N", L, 93000, 0.026, 3, "reel3000"],
  ["OSK2730N", O, 11000, 0.1, 2, "loose"],
  ["OSK2730N", H, 2700, 0.08, 10, "broker"],
  ["OSK2730P", L, 61000, 0.028, 3, "reel3000"],
  ["OSK2730P", O, 0, 0.11, 56, "loose"],
  ["MLB461T", L, 21000, 0.07, 3, "loose"],
  ["MLB462T", L, 44000, 0.07, 3, "loose"],
  ["MLB462T", O, 16000, 0.085, 2, "loose"],
  ["MLB463T", L, 18000, 0.09, 3, "loose"],
  ["MLB463T", O, 5200, 0.1, 2, "loose"],
  ["MLB561T", L, 17000, 0.075, 3, "loose"],
  ["MLB562T", L, 38000, 0.075, 3, "loose"],
  ["MLB562T", O, 12000, 0.09, 2, "loose"],
  ["MLB462S", L, 150000, 0.018, 3, "reel3000"],
  ["MLB462S", O, 42000, 0.065, 2, "loose"],
  ["MLB462S", H, 6500, 0.05, 12, "broker"],
  ["MLB562S", L, 118000, 0.019, 3, "reel3000"],
  ["MLB562S", O, 36000, 0.068, 2, "loose"],
  ["MLB462M", L, 26000, 0.058, 3, "reel3000"],
  ["MLB462M", O, 6200, 0.17, 2, "loose"],
  ["MLB562M", L, 23000, 0.062, 3, "reel3000"],
  ["OSK4510N", L, 12500, 0.21, 3, "loose"],
  ["OSK4510N", O, 4100, 0.24, 2, "loose"],
  ["OSK4510P", L, 9600, 0.23, 3, "loose"],
  ["OSK4510P", O, 2900, 0.26, 2, "loose"],
  ["OSK4530N", L, 36000, 0.052, 3, "reel3000"],
  ["OSK4530P", L, 30000, 0.055, 3, "reel3000"],
  ["OSK4530P", O, 0, 0.19, 84, "loose"],
  ["OSK4590N", L, 1500, 0.82, 5, "loose"],
  ["OSK4590N", O, 650, 0.92, 2, "loose"],
  ["OSK4590P", L, 1300, 0.86, 5, "loose"],
  ["OSK4580N", L, 2400, 0.44, 5, "loose"],
  ["TW-K1340", O, 7800, 0.12, 2, "loose"],
  ["TW-K1340C", O, 6600, 0.13, 2, "loose"],
  ["TW-K1360", O, 15500, 0.085, 2, "loose"],
  ["TW-K1360", L, 0, 0.028, 42, "reel3000"],
  ["TW-K2450", O, 5600, 0.19, 2, "loose"],
  ["TW-K2450", L, 2100, 0.2, 4, "loose"],
  ["TW-K2450C", O, 4700, 0.21, 2, "loose"],
  ["TW-K2470", O, 17000, 0.09, 2, "loose"],
  ["MLB436T", L, 9000, 0.1, 3, "loose"],
  ["MLB536T", L, 7600, 0.11, 3, "loose"],
  ["MLB436S", L, 24000, 0.042, 5, "reel3000"],
  ["OSK1190N", H, 1700, 0.33, 10, "broker"],
  ["MLB419S", L, 42000, 0.058, 3, "reel3000"],
  ["MLB419S", O, 8800, 0.2, 2, "loose"],
  ["MLB519S", L, 36000, 0.062, 3, "reel3000"],
  ["MLB414T", L, 3400, 0.18, 5, "loose"],
  ["MLB414T", H, 850, 0.27, 14, "broker"],
  ["MLB467T", L, 4300, 0.15, 4, "loose"],
  ["MLB567T", L, 0, 0.16, 70, "loose"],
  ["TW-G2350", L, 8200, 0.068, 3, "reel1000"],
  ["TW-G2350", O, 5000, 0.21, 2, "loose"],
  ["TW-G2350C", L, 7100, 0.072, 3, "reel1000"],
  ["TW-G2350C", O, 3900, 0.22, 2, "loose"],
  ["TW-G2390", O, 3200, 0.25, 2, "loose"],
  ["TW-G2390C", O, 2800, 0.26, 2, "loose"],
  ["TW-G2420", L, 12500, 0.115, 3, "reel1000"],
  ["TW-G2420", O, 2500, 0.36, 2, "loose"],
  ["TW-G2420", H, 420, 0.52, 10, "broker"],
  ["TW-G2420C", L, 9300, 0.125, 3, "reel1000"],
  ["TW-G3151", L, 6400, 0.26, 3, "loose"],
  ["TW-G3152", L, 6900, 0.27, 3, "loose"],
  ["TW-G3152", O, 2100, 0.3, 2, "loose"],
  ["TW-G3151C", L, 5900, 0.27, 3, "loose"],
  ["TW-G3152C", L, 6300, 0.28, 3, "loose"],
  ["TW-G3152C", O, 1700, 0.31, 2, "loose"],
  ["TW-G3190", L, 4300, 0.3, 3, "loose"],
  ["TW-G3190", O, 1150, 0.33, 2, "loose"],
  ["TW-G3190C", L, 3800, 0.31, 3, "loose"],
  ["TW-G3190C", O, 900, 0.34, 2, "loose"],
  ["QX12-070", L, 2700, 0.41, 4, "loose"],
  ["QX12-070", O, 1450, 0.45, 2, "loose"],
  ["QX13-070", L, 2400, 0.43, 4, "loose"],
  ["QX18-110", H, 580, 0.62, 12, "broker"],
  ["VPD6145", L, 3100, 0.7, 4, "tube50"],
  ["VPD6145", O, 1050, 0.77, 2, "loose"],
  ["VPD7145", L, 2800, 0.73, 4, "tube50"],
  ["VPD7145", O, 900, 0.8, 2, "loose"],
  ["VPD6165", L, 5200, 0.66, 4, "tube50"],
  ["VPD6165", O, 2100, 0.72, 2, "loose"],
  ["VPD6165", H, 320, 0.92, 10, "broker"],
  ["VPD7165", L, 4700, 0.69, 4, "tube50"],
  ["VPD7165", O, 1750, 0.75, 2, "loose"],
  ["VPD6185", L, 2000, 0.53, 4, "tube50"],
  ["VPD7185", L, 1850, 0.55, 4, "tube50"],
  ["VPD6125", L, 1450, 0.93, 4, "tube50"],
  ["VPD6125", O, 620, 1.02, 2, "loose"],
  ["VPD7125", L, 1050, 0.98, 4, "tube50"],
  ["VPD6195", L, 880, 3.1, 5, "loose"],
  ["VPD6195", O, 430, 3.35, 3, "loose"],
  ["VPD7195", L, 820, 3.2, 5, "loose"],
  ["VPD7195", O, 370, 3.45, 3, "loose"],
  ["VPD6175", L, 0, 2.85, 98, "loose"],
  ["VPD6175", O, 210, 3.05, 3, "loose"],
  ["VPD7175", O, 190, 3.15, 3, "loose"],
  ["VPD6310", H, 130, 6.6, 14, "tray"],
  ["VPD6310", L, 55, 5.7, 5, "tray"],
  ["VPD7310", H, 35, 9.2, 21, "tray"],
  ["VPD6360", L, 300, 8.2, 5, "tray"],
  ["VPD6360", O, 140, 8.9, 3, "tray"],
  ["VPD7360", L, 270, 8.5, 5, "tray"],
  ["QX40-125", L, 2250, 0.86, 4, "tube50"],
  ["QX40-125", O, 780, 0.94, 2, "loose"],
  ["QX41-125", L, 2050, 0.9, 4, "tube50"],
  ["QX42-065", H, 680, 0.58, 12, "broker"],
  ["QX44-420", O, 1250, 1.12, 2, "loose"],
  ["QX46-150", L, 720, 2.35, 5, "loose"],
  ["QX46-150", O, 290, 2.55, 3, "loose"],
  ["QX47-150", L, 650, 2.45, 5, "loose"],
  ["QX52-170", H, 85, 11.2, 18, "tray"],
  ["QX52-170", L, 22, 9.6, 5, "tray"],
  ["VPD8125", L, 2600, 0.96, 4, "tube50"],
  ["VPD8125", O, 980, 1.06, 2, "loose"],
  ["VPD9125", L, 2350, 1, 4, "tube50"],
  ["VPD9125", O, 820, 1.1, 2, "loose"],
  ["VPD8165", L, 170, 7.4, 5, "tray"],
  ["VPD8165", O, 90, 8, 3, "tray"],
  ["VPD9165", L, 140, 7.7, 5, "tray"],
  ["VPD8245", L, 380, 3.8, 5, "loose"],
  ["QX60-085", L, 3500, 0.47, 4, "loose"],
  ["QX62-055", L, 4800, 0.105, 3, "reel1000"],
  ["QX62-055", O, 1700, 0.34, 2, "loose"],
  ["QX64-110", O, 1350, 0.88, 2, "loose"],
  ["OSK6430N", L, 8600, 0.2, 3, "loose"],
  ["OSK6430N", O, 2900, 0.23, 2, "loose"],
  ["OSK6430P", L, 7700, 0.21, 3, "loose"],
  ["MLB472S", L, 0, 0.044, 63, "reel3000"],
  ["MLB472S", H, 2900, 0.11, 10, "broker"],
];

function buildPriceBreaks(firstPrice: number, packing: Packing): PriceBreak[] {
  return PACKING_TERMS[packing].breaks.map(([quantity, priceFactor]) => ({
    quantity,
    // Suppliers quote unit prices to four decimals.
    unitPrice: Math.round(firstPrice * priceFactor * 10_000) / 10_000,
  }));
}

export interface DemoOffer {
  manufacturer: string;
  partNumber: string;
  offer: Offer;
}

function buildOffer([partNumber, supplierName, stock, firstPrice, leadDays, packing]: OfferRow): DemoOffer {
  // Each manufacturer's numbering scheme names it; the reference test checks every offer names a catalogue part.
  const maker = demoManufacturers.find((candidate) => candidate.partNumberPattern.test(partNumber));
  const supplier = demoSuppliers.find((candidate) => candidate.name === supplierName);
  if (!maker || !supplier) throw new Error(`demo offer names an unknown part or supplier: ${partNumber} / ${supplierName}`);
  const terms = PACKING_TERMS[packing];
  return {
    manufacturer: maker.name,
    partNumber,
    offer: {
      supplier: supplier.name,
      supplierSku: supplier.buildSku(partNumber),
      stock,
      minimumOrder: terms.minimumOrder,
      orderMultiple: terms.orderMultiple,
      priceBreaks: buildPriceBreaks(firstPrice, packing),
      currency: supplier.currency,
      leadTimeDays: leadDays,
      asOf: supplier.asOf,
    },
  };
}

export const demoOffers: DemoOffer[] = OFFER_ROWS.map(buildOffer);
