// The messy librarian file fixtures/demo/parts-messy.csv: new parts of the demo's own families, typed the way people
// type datasheet values (units in the header or in the cell, with and without a space, both micro spellings, odd
// lifecycle words), with four rows a librarian must fix: hFE min and max swapped (row 6), a voltage in the IC max
// column (row 8), a lost part number (row 11) and a gain point without its current (row 14). Every number comes from
// the generated parts; only the spelling is chosen here.
import type { PartSpec } from "#app/domain/part.ts";
import { type Dimension, formatQuantity } from "#app/domain/quantity.ts";

const COLUMNS = {
  manufacturer: "Manufacturer",
  partNumber: "Part Number",
  polarity: "Polarity",
  package: "Package",
  configuration: "Configuration",
  vceo: "VCEO",
  vcbo: "VCBO",
  vebo: "VEBO",
  icMax: "IC max [mA]",
  ptot: "Ptot",
  ptotRef: "Ptot ref",
  tjMax: "Tj max",
  rthJa: "Rth-ja [K/W]",
  rthJc: "Rth-jc",
  vbeOn: "VBE on",
  ft: "fT",
  cob: "Cob",
  early: "Early voltage",
  lifecycle: "Lifecycle",
  url: "Datasheet URL",
  date: "Datasheet date",
  g1Ic: "gain1_ic",
  g1Vce: "gain1_vce",
  g1Min: "gain1_hfe_min",
  g1Typ: "gain1_hfe_typ",
  g1Max: "gain1_hfe_max",
  g2Ic: "gain2_ic",
  g2Vce: "gain2_vce",
  g2Min: "gain2_hfe_min",
  g2Typ: "gain2_hfe_typ",
  g2Max: "gain2_hfe_max",
  s1Ic: "sat1_ic",
  s1Ib: "sat1_ib",
  s1Vce: "sat1_vce_max",
  s1Vbe: "sat1_vbe",
} as const;

type Column = keyof typeof COLUMNS;
type Cells = Record<Column, string>;

/** How a row writes its quantities: `250 mA`, `250mA`, or plain numbers where the unit is understood (V, °C, °C/W). */
type Spelling = "spaced" | "tight" | "bare";

interface MessyRow {
  partNumber: string;
  spelling: Spelling;
  /** Cells typed differently from the row's spelling, or wrong on purpose. */
  cells?: (part: PartSpec, spelled: Cells) => Partial<Cells>;
  /** Cells the librarian's spreadsheet wrapped in quotes. */
  quoted?: Column[];
}

const spaced = (value: number | null, dimension: Dimension, ascii = false) =>
  value === null ? "" : formatQuantity(value, dimension, { digits: 6, ascii });
const tight = (value: number | null, dimension: Dimension) => spaced(value, dimension).replace(" ", "");
const plain = (value: number | null) => (value === null ? "" : String(value));
const milli = (value: number) => String(Number((value * 1e3).toPrecision(12)));

function spell(part: PartSpec, spelling: Spelling): Cells {
  const [g1, g2] = part.gainPoints;
  const [s1] = part.saturationPoints;
  const unit = spelling === "tight" ? tight : spaced;
  // Plain numbers only where the parser knows the unit without one: volts, degrees Celsius, °C/W.
  const understood = (value: number | null, dimension: Dimension) => (spelling === "bare" ? plain(value) : unit(value, dimension));
  return {
    manufacturer: part.manufacturer,
    partNumber: part.partNumber,
    polarity: part.polarity.toUpperCase(),
    package: part.packageName,
    configuration: part.configuration === "single" ? "" : part.configuration,
    vceo: understood(part.vceoVolts, "voltage"),
    vcbo: understood(part.vcboVolts, "voltage"),
    vebo: understood(part.veboVolts, "voltage"),
    icMax: milli(part.icMaxAmps),
    ptot: unit(part.ptotWatts, "power"),
    ptotRef: part.ptotReference ?? "",
    tjMax: understood(part.tjMaxC, "temperature"),
    rthJa: plain(part.rthJaCPerW),
    rthJc: plain(part.rthJcCPerW),
    vbeOn: understood(part.vbeOnVolts, "voltage"),
    ft: unit(part.ftHz, "frequency"),
    cob: unit(part.cobFarads, "capacitance"),
    early: understood(part.earlyVolts, "voltage"),
    lifecycle: part.lifecycle,
    url: part.datasheetUrl ?? "",
    date: part.datasheetRevisionDate ?? "",
    g1Ic: unit(g1.icAmps, "current"),
    g1Vce: understood(g1.vceVolts, "voltage"),
    g1Min: plain(g1.hfeMin),
    g1Typ: plain(g1.hfeTyp),
    g1Max: plain(g1.hfeMax),
    g2Ic: g2 ? unit(g2.icAmps, "current") : "",
    g2Vce: g2 ? understood(g2.vceVolts, "voltage") : "",
    g2Min: plain(g2?.hfeMin ?? null),
    g2Typ: plain(g2?.hfeTyp ?? null),
    g2Max: plain(g2?.hfeMax ?? null),
    s1Ic: s1 ? unit(s1.icAmps, "current") : "",
    s1Ib: s1 ? unit(s1.ibAmps, "current") : "",
    s1Vce: s1 ? unit(s1.vceSatMaxVolts, "voltage") : "",
    s1Vbe: s1 ? unit(s1.vbeSatVolts, "voltage") : "",
  };
}

export const MESSY_ROWS: MessyRow[] = [
  { partNumber: "OSK2750N", spelling: "spaced", cells: () => ({ configuration: "single" }) },
  {
    partNumber: "OSK2750P",
    spelling: "tight",
    cells: (part) => ({
      polarity: "pnp",
      ptot: `${part.ptotWatts} W`,
      vbeOn: part.vbeOnVolts!.toFixed(2),
      lifecycle: "Active",
      s1Vce: spaced(part.saturationPoints[0].vceSatMaxVolts, "voltage"),
      s1Vbe: plain(part.saturationPoints[0].vbeSatVolts),
    }),
  },
  {
    partNumber: "OSK4560N",
    spelling: "bare",
    cells: (part) => ({
      polarity: "npn",
      icMax: spaced(part.icMaxAmps, "current"),
      ptot: tight(part.ptotWatts, "power"),
      vbeOn: spaced(part.vbeOnVolts, "voltage"),
      s1Vce: spaced(part.saturationPoints[0].vceSatMaxVolts, "voltage"),
    }),
    quoted: ["g1Ic"],
  },
  { partNumber: "MLB468T", spelling: "spaced", cells: (part) => ({ g1Ic: spaced(part.gainPoints[0].icAmps, "current", true) }) },
  {
    partNumber: "MLB568T",
    spelling: "tight",
    // hFE min and max swapped at the second point: the librarian must fix this row.
    cells: (_part, cells) => ({ g2Min: cells.g2Max, g2Max: cells.g2Min, g1Ic: cells.g1Ic.replace("µ", "u") }),
  },
  { partNumber: "MLB474S", spelling: "spaced", cells: (part) => ({ tjMax: `${part.tjMaxC} C`, lifecycle: "NRND" }) },
  // A voltage typed into the IC max column.
  { partNumber: "TW-K1350", spelling: "spaced", cells: (_part, cells) => ({ icMax: cells.vceo }) },
  { partNumber: "TW-G2370", spelling: "spaced", cells: (part) => ({ icMax: spaced(part.icMaxAmps, "current") }) },
  { partNumber: "TW-G2370C", spelling: "tight", cells: (part) => ({ vbeOn: plain(part.vbeOnVolts), ft: spaced(part.ftHz, "frequency") }) },
  // A catalogue row pasted without its part number.
  { partNumber: "VPD6185", spelling: "spaced", cells: () => ({ partNumber: "" }) },
  { partNumber: "VPD6147", spelling: "spaced", cells: (part) => ({ rthJc: spaced(part.rthJcCPerW, "thermal-resistance") }) },
  { partNumber: "VPD7147", spelling: "tight", cells: (part) => ({ icMax: tight(part.icMaxAmps, "current") }) },
  {
    partNumber: "VPD8235",
    spelling: "spaced",
    // A second gain point started but left without its current.
    cells: (_part, cells) => ({ g2Vce: cells.g1Vce, g2Min: cells.g1Min }),
  },
  { partNumber: "QX14-060", spelling: "spaced", cells: () => ({ lifecycle: "last time buy" }) },
  { partNumber: "QX15-060", spelling: "spaced", cells: (part) => ({ lifecycle: "LTB", icMax: spaced(part.icMaxAmps, "current") }) },
  { partNumber: "VPD6340", spelling: "spaced" },
];

const quote = (text: string) => `"${text.replace(/"/g, '""')}"`;

/** The messy file's text: the header, then one line per row, each cell spelled as its row says. */
export function writeMessyPartsCsv(messyParts: readonly PartSpec[], catalogue: readonly PartSpec[]): string {
  const columns = Object.keys(COLUMNS) as Column[];
  const lines = [columns.map((column) => COLUMNS[column]).join(",")];
  for (const row of MESSY_ROWS) {
    const part = [...messyParts, ...catalogue].find((candidate) => candidate.partNumber === row.partNumber);
    if (!part) throw new Error(`messy intake row names an unknown part ${row.partNumber}`);
    const base = spell(part, row.spelling);
    const cells: Cells = { ...base, ...row.cells?.(part, base) };
    lines.push(
      columns
        .map((column) => {
          const text = cells[column];
          return row.quoted?.includes(column) || /[",\n]/.test(text) ? quote(text) : text;
        })
        .join(","),
    );
  }
  return `${lines.join("\n")}\n`;
}
