// The invented manufacturers of the demo catalogue; every name and numbering scheme is fictional.

export interface DemoManufacturer {
  name: string;
  /** How this manufacturer numbers its parts, in words, for the demo's readers. */
  partNumberStyle: string;
  partNumberPattern: RegExp;
  /** The PNP complement's number for an NPN part number, by this manufacturer's scheme. */
  nameComplement: (npnPartNumber: string) => string;
}

export const OSTREVIK = "Ostrevik Semiconductor";
export const MAELBROOK = "Maelbrook Devices";
export const TARNWELL = "Tarnwell Microsystems";
export const VELLACOTT = "Vellacott Power Devices";
export const QUARROW = "Quarrow Electronics";

export const demoManufacturers: DemoManufacturer[] = [
  {
    name: OSTREVIK,
    partNumberStyle: "OSK + four digits + N (NPN) or P (PNP); complements share the digits, e.g. OSK2210N / OSK2210P",
    partNumberPattern: /^OSK\d{4}[NP]$/,
    nameComplement: (npn) => npn.replace(/N$/, "P"),
  },
  {
    name: MAELBROOK,
    partNumberStyle:
      "MLB + three digits + package letter (T TO-92, S SOT-23, M SOT-363); first digit 4 NPN, 5 PNP, e.g. MLB481T / MLB581T",
    partNumberPattern: /^MLB[45]\d{2}[TSM]$/,
    nameComplement: (npn) => npn.replace(/^MLB4/, "MLB5"),
  },
  {
    name: TARNWELL,
    partNumberStyle:
      "TW- + family letter (K small-signal, G medium power) + four digits; the PNP complement adds C, e.g. TW-G2205 / TW-G2205C",
    partNumberPattern: /^TW-[KG]\d{4}C?$/,
    nameComplement: (npn) => `${npn}C`,
  },
  {
    name: VELLACOTT,
    partNumberStyle:
      "VPD + four digits; first digit 6 NPN, 7 PNP, 8 NPN Darlington, 9 PNP Darlington, e.g. VPD6140 / VPD7140",
    partNumberPattern: /^VPD[6-9]\d{3}$/,
    nameComplement: (npn) => npn.replace(/^VPD6/, "VPD7").replace(/^VPD8/, "VPD9"),
  },
  {
    name: QUARROW,
    partNumberStyle:
      "QX + two-digit series (even NPN, next odd PNP) + - + VCEO in volts, e.g. QX40-100 / QX41-100",
    partNumberPattern: /^QX\d{2}-\d{3}$/,
    nameComplement: (npn) =>
      npn.replace(/^QX(\d{2})/, (_match, series: string) => `QX${String(Number(series) + 1).padStart(2, "0")}`),
  },
];
