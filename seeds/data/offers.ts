// Invented supplier offers for the demo catalogue: three fictional suppliers, prices as of late 2026.
import type { Offer, PriceBreak } from "#app/domain/part.ts";
import { demoParts } from "./parts.ts";

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
  ["OSK2210N", L, 24000, 0.14, 3, "loose"],
  ["OSK2210N", O, 8200, 0.16, 2, "loose"],
  ["OSK2210P", L, 18500, 0.15, 3, "loose"],
  ["OSK2210P", O, 5100, 0.17, 2, "loose"],
  ["OSK2230N", L, 96000, 0.028, 3, "reel3000"],
  ["OSK2230N", O, 12000, 0.11, 2, "loose"],
  ["OSK2230N", H, 2500, 0.09, 10, "broker"],
  ["OSK2230P", L, 63000, 0.03, 3, "reel3000"],
  ["OSK2230P", O, 0, 0.12, 56, "loose"],
  ["OSK3050N", L, 31000, 0.09, 3, "loose"],
  ["OSK3050P", L, 27500, 0.1, 3, "loose"],
  ["OSK1102N", H, 1800, 0.35, 10, "broker"],
  ["MLB481T", L, 42000, 0.08, 3, "loose"],
  ["MLB481T", O, 15000, 0.09, 2, "loose"],
  ["MLB581T", L, 39000, 0.08, 3, "loose"],
  ["MLB581T", O, 11000, 0.09, 2, "loose"],
  ["MLB481S", L, 150000, 0.019, 3, "reel3000"],
  ["MLB481S", O, 45000, 0.07, 2, "loose"],
  ["MLB481S", H, 6000, 0.05, 12, "broker"],
  ["MLB581S", L, 120000, 0.02, 3, "reel3000"],
  ["MLB581S", O, 38000, 0.07, 2, "loose"],
  ["MLB430S", L, 21000, 0.045, 5, "reel3000"],
  ["MLB412T", L, 3500, 0.19, 5, "loose"],
  ["MLB412T", H, 900, 0.28, 14, "broker"],
  ["MLB418S", L, 45000, 0.06, 3, "reel3000"],
  ["MLB418S", O, 9000, 0.21, 2, "loose"],
  ["MLB460T", L, 4200, 0.16, 4, "loose"],
  ["MLB560T", L, 0, 0.17, 70, "loose"],
  ["TW-K1120", O, 7600, 0.13, 2, "loose"],
  ["TW-K1120C", O, 6900, 0.14, 2, "loose"],
  ["OSK4401N", L, 12000, 0.22, 3, "loose"],
  ["OSK4401N", O, 4300, 0.25, 2, "loose"],
  ["OSK4401P", L, 9800, 0.24, 3, "loose"],
  ["OSK4401P", O, 3100, 0.27, 2, "loose"],
  ["OSK4431N", L, 36000, 0.055, 3, "reel3000"],
  ["OSK4431P", L, 30000, 0.058, 3, "reel3000"],
  ["OSK4431P", O, 0, 0.2, 84, "loose"],
  ["OSK4480N", L, 2600, 0.45, 5, "loose"],
  ["MLB449T", L, 16000, 0.12, 3, "loose"],
  ["MLB549T", L, 14500, 0.13, 3, "loose"],
  ["MLB449S", L, 60000, 0.03, 3, "reel3000"],
  ["MLB449S", O, 21000, 0.1, 2, "loose"],
  ["MLB549S", L, 54000, 0.032, 3, "reel3000"],
  ["TW-K2210", O, 5400, 0.2, 2, "loose"],
  ["TW-K2210", L, 2000, 0.21, 4, "loose"],
  ["TW-K2210C", O, 4800, 0.22, 2, "loose"],
  ["TW-K2260", O, 18000, 0.09, 2, "loose"],
  ["TW-K2260", L, 0, 0.03, 42, "reel3000"],
  ["MLB481M", L, 27000, 0.06, 3, "reel3000"],
  ["MLB481M", O, 6000, 0.18, 2, "loose"],
  ["MLB581M", L, 24000, 0.065, 3, "reel3000"],
  ["OSK4491N", L, 1500, 0.85, 5, "loose"],
  ["OSK4491N", O, 700, 0.95, 2, "loose"],
  ["TW-G2205", L, 8000, 0.07, 3, "reel1000"],
  ["TW-G2205", O, 5200, 0.22, 2, "loose"],
  ["TW-G2205C", L, 7000, 0.075, 3, "reel1000"],
  ["TW-G2205C", O, 4100, 0.23, 2, "loose"],
  ["TW-G2260", O, 3300, 0.26, 2, "loose"],
  ["TW-G2260C", O, 2900, 0.27, 2, "loose"],
  ["TW-G2290", L, 12000, 0.12, 3, "reel1000"],
  ["TW-G2290", O, 2600, 0.38, 2, "loose"],
  ["TW-G2290", H, 400, 0.55, 10, "broker"],
  ["TW-G2290C", L, 9000, 0.13, 3, "reel1000"],
  ["TW-G3140", L, 6500, 0.28, 3, "loose"],
  ["TW-G3140C", L, 6100, 0.29, 3, "loose"],
  ["TW-G3180", L, 4400, 0.31, 3, "loose"],
  ["TW-G3180", O, 1200, 0.34, 2, "loose"],
  ["TW-G3180C", L, 3900, 0.32, 3, "loose"],
  ["TW-G3180C", O, 950, 0.35, 2, "loose"],
  ["QX12-060", L, 2800, 0.42, 4, "loose"],
  ["QX12-060", O, 1500, 0.46, 2, "loose"],
  ["QX13-060", L, 2500, 0.44, 4, "loose"],
  ["QX12-100", H, 600, 0.65, 12, "broker"],
  ["VPD6140", L, 3200, 0.72, 4, "tube50"],
  ["VPD6140", O, 1100, 0.79, 2, "loose"],
  ["VPD7140", L, 2900, 0.75, 4, "tube50"],
  ["VPD7140", O, 950, 0.82, 2, "loose"],
  ["VPD6160", L, 5400, 0.68, 4, "tube50"],
  ["VPD6160", O, 2200, 0.74, 2, "loose"],
  ["VPD6160", H, 300, 0.95, 10, "broker"],
  ["VPD7160", L, 4800, 0.7, 4, "tube50"],
  ["VPD7160", O, 1800, 0.77, 2, "loose"],
  ["VPD6180", L, 2100, 0.55, 4, "tube50"],
  ["VPD7180", L, 1900, 0.57, 4, "tube50"],
  ["VPD6120", L, 1400, 0.95, 4, "tube50"],
  ["VPD6120", O, 600, 1.05, 2, "loose"],
  ["VPD7120", L, 1100, 1.0, 4, "tube50"],
  ["VPD6250", L, 900, 3.2, 5, "loose"],
  ["VPD6250", O, 450, 3.45, 3, "loose"],
  ["VPD7250", L, 850, 3.3, 5, "loose"],
  ["VPD7250", O, 380, 3.55, 3, "loose"],
  ["VPD6230", L, 0, 2.9, 98, "loose"],
  ["VPD6230", O, 220, 3.1, 3, "loose"],
  ["VPD6300", H, 140, 6.8, 14, "tray"],
  ["VPD6300", L, 60, 5.9, 5, "tray"],
  ["VPD7300", H, 40, 9.5, 21, "tray"],
  ["VPD6350", L, 320, 8.4, 5, "tray"],
  ["VPD6350", O, 150, 9.1, 3, "tray"],
  ["VPD7350", L, 290, 8.7, 5, "tray"],
  ["QX40-100", L, 2300, 0.88, 4, "tube50"],
  ["QX40-100", O, 800, 0.96, 2, "loose"],
  ["QX41-100", L, 2100, 0.92, 4, "tube50"],
  ["QX40-060", H, 700, 0.6, 12, "broker"],
  ["QX44-400", O, 1300, 1.15, 2, "loose"],
  ["QX46-140", L, 750, 2.4, 5, "loose"],
  ["QX46-140", O, 300, 2.6, 3, "loose"],
  ["QX47-140", L, 680, 2.5, 5, "loose"],
  ["QX52-160", H, 90, 11.5, 18, "tray"],
  ["QX52-160", L, 25, 9.8, 5, "tray"],
  ["VPD8120", L, 2700, 0.98, 4, "tube50"],
  ["VPD8120", O, 1000, 1.08, 2, "loose"],
  ["VPD9120", L, 2400, 1.02, 4, "tube50"],
  ["VPD9120", O, 850, 1.12, 2, "loose"],
  ["VPD8160", L, 180, 7.6, 5, "tray"],
  ["VPD8160", O, 95, 8.2, 3, "tray"],
  ["VPD9160", L, 150, 7.9, 5, "tray"],
  ["VPD8240", L, 400, 3.9, 5, "loose"],
  ["QX60-080", L, 3600, 0.48, 4, "loose"],
  ["QX62-060", L, 5000, 0.11, 3, "reel1000"],
  ["QX62-060", O, 1800, 0.35, 2, "loose"],
  ["QX64-100", O, 1400, 0.9, 2, "loose"],
  ["OSK6420N", L, 8800, 0.21, 3, "loose"],
  ["OSK6420N", O, 3000, 0.24, 2, "loose"],
  ["OSK6420P", L, 7900, 0.22, 3, "loose"],
  ["MLB470S", L, 0, 0.045, 63, "reel3000"],
  ["MLB470S", H, 3000, 0.12, 10, "broker"],
];

function buildPriceBreaks(firstPrice: number, packing: Packing): PriceBreak[] {
  return PACKING_TERMS[packing].breaks.map(([quantity, priceFactor]) => ({
    quantity,
    // Suppliers quote unit prices to four decimals.
    unitPrice: Math.round(firstPrice * priceFactor * 10_000) / 10_000,
  }));
}

function buildOffer([partNumber, supplierName, stock, firstPrice, leadDays, packing]: OfferRow): {
  manufacturer: string;
  partNumber: string;
  offer: Offer;
} {
  const part = demoParts.find((candidate) => candidate.partNumber === partNumber);
  const supplier = demoSuppliers.find((candidate) => candidate.name === supplierName);
  if (!part || !supplier) throw new Error(`demo offer names an unknown part or supplier: ${partNumber} / ${supplierName}`);
  const terms = PACKING_TERMS[packing];
  return {
    manufacturer: part.manufacturer,
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

export const demoOffers: Array<{ manufacturer: string; partNumber: string; offer: Offer }> = OFFER_ROWS.map(buildOffer);
