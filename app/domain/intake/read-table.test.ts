import { describe, expect, it } from "vitest";
import { INTAKE_FORMATS } from "./columns";
import { normaliseHeaderCell, readTable, sniffDelimiter, type TableRecord } from "./read-table";

const encode = (text: string) => new TextEncoder().encode(text);
const records = (text: string) => {
  const seen: TableRecord[] = [];
  readTable(encode(text), INTAKE_FORMATS.offers).eachRecord((record) => {
    seen.push(record);
  });
  return seen;
};
const OFFERS_HEADER = "manufacturer,part_number,supplier,stock,currency,as_of,break1_qty,break1_price";

describe("sniffDelimiter", () => {
  it.each([
    ["a,b,c\n1;2", ","],
    ["a;b;c\n1,5;2", ";"],
    ["a\tb\tc\n", "\t"],
    ["a|b|c", "|"],
    ['"a;b",c,d', ","],
    ["single", ","],
  ])("reads %j as delimited by %j", (text, delimiter) => {
    expect(sniffDelimiter(text)).toBe(delimiter);
  });
});

describe("normaliseHeaderCell", () => {
  it.each([
    ["  IC_Max [mA] ", { name: "ic_max", unit: "mA" }],
    ["rth_ja [°C/W]", { name: "rth_ja", unit: "°C/W" }],
    ["Part Number", { name: "part_number", unit: null }],
    ["datasheet-url", { name: "datasheet_url", unit: null }],
    ["vceo []", { name: "vceo", unit: null }],
  ])("normalises %j", (cell, expected) => {
    expect(normaliseHeaderCell(cell)).toEqual(expected);
  });
});

describe("readTable", () => {
  it("maps numbered groups and streams records with spreadsheet row numbers", () => {
    const text = `${OFFERS_HEADER},break2_qty,break2_price\n"Quillon\nDevices",QD-1,Harbour,1,EUR,2024-06-01,1,0.5,10,0.4\n\nQuillon Devices,QD-2,Harbour,1,EUR,2024-06-01,1,0.5,,\n`;
    const table = readTable(encode(text), INTAKE_FORMATS.offers);
    expect(table.ok).toBe(true);
    expect(table.columns.filter((c) => c.group).map((c) => [c.name, c.pointNumber])).toEqual([
      ["break1_qty", 1],
      ["break1_price", 1],
      ["break2_qty", 2],
      ["break2_price", 2],
    ]);
    expect(records(text).map((r) => [r.row, r.cells[0]])).toEqual([
      [2, "Quillon\nDevices"],
      [4, "Quillon Devices"],
    ]);
  });

  it("marks a record whose quote never closes", () => {
    const [record] = records(`${OFFERS_HEADER}\nQuillon Devices,"QD-1,Harbour,1,EUR,2024-06-01,1,0.5\n`);
    expect(record.quoteProblem).toBe("a quoted cell starting on this row is never closed, so the rest of the file ran into it: a closing double quote is missing");
  });

  it("refuses the file when the header has an error, and streams nothing", () => {
    const table = readTable(encode(`${OFFERS_HEADER},stock\nx\n`), INTAKE_FORMATS.offers);
    expect(table.ok).toBe(false);
    expect(table.problems.map((p) => p.message)).toEqual(['column "stock" appears twice (columns 4 and 9)']);
  });
});
