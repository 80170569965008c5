import { describe, expect, it } from "vitest";
import { offerKey, parseOffersFile } from "./parse-offers";

const encode = (text: string) => new TextEncoder().encode(text);
const HEADER = "manufacturer,part_number,supplier,stock,currency,as_of,break1_qty,break1_price,break4_qty,break4_price";

describe("parseOffersFile", () => {
  it("reads offers with defaults, numbered breaks with gaps, and decimal commas in a semicolon file", () => {
    const text = `${HEADER.replaceAll(",", ";")}\nLarkfield Semiconductor;LS-N100;Harbour Components;1e3;eur;2024-06-01;1;0,12;100;0,095\n`;
    const { rows, problems } = parseOffersFile(encode(text));
    expect(problems).toEqual([]);
    expect(rows).toEqual([
      {
        row: 2,
        value: {
          manufacturer: "Larkfield Semiconductor",
          partNumber: "LS-N100",
          offer: {
            supplier: "Harbour Components",
            supplierSku: null,
            stock: 1000,
            minimumOrder: 1,
            orderMultiple: 1,
            priceBreaks: [
              { quantity: 1, unitPrice: 0.12 },
              { quantity: 100, unitPrice: 0.095 },
            ],
            currency: "EUR",
            leadTimeDays: null,
            asOf: "2024-06-01",
          },
        },
      },
    ]);
  });

  it("accepts the same part from two suppliers", () => {
    const text = `${HEADER}\nLarkfield Semiconductor,LS-N100,Harbour Components,5,EUR,2024-06-01,1,0.1,,\nLarkfield Semiconductor,LS-N100,Tenterden Parts,5,EUR,2024-06-01,1,0.1,,\n`;
    expect(parseOffersFile(encode(text)).rows).toHaveLength(2);
  });
});

describe("offerKey", () => {
  it("ignores case and surrounding spaces", () => {
    expect(offerKey({ manufacturer: " Larkfield ", partNumber: "ls-1", supplier: "Harbour " })).toBe(offerKey({ manufacturer: "larkfield", partNumber: "LS-1", supplier: "harbour" }));
  });
});
