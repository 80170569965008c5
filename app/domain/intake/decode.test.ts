import { describe, expect, it } from "vitest";
import { decodeIntakeBytes } from "./decode";

const bytes = (...values: number[]) => new Uint8Array(values);
const utf8 = (text: string) => new TextEncoder().encode(text);
const message = (input: Uint8Array) => {
  const result = decodeIntakeBytes(input);
  return result.ok ? null : result.problem.message;
};

describe("decodeIntakeBytes", () => {
  it("decodes UTF-8 with and without a byte order mark (EF BB BF, Unicode 15 section 23.8)", () => {
    expect(decodeIntakeBytes(utf8("a,b\n1 µA,2 °C\n"))).toEqual({ ok: true, text: "a,b\n1 µA,2 °C\n" });
    expect(decodeIntakeBytes(new Uint8Array([0xef, 0xbb, 0xbf, ...utf8("a,b\n")]))).toEqual({ ok: true, text: "a,b\n" });
  });

  it("refuses empty and blank files", () => {
    expect(message(bytes())).toBe("The file is empty.");
    expect(message(utf8(" \r\n\t\n"))).toBe("The file is empty.");
  });

  it("recognises UTF-16 by its byte order mark, either byte order", () => {
    const expected = "The file is not UTF-8 text: it is UTF-16 (it starts with a UTF-16 byte order mark). Save it as CSV UTF-8 and upload it again.";
    expect(message(bytes(0xff, 0xfe, 0x61, 0x00))).toBe(expected);
    expect(message(bytes(0xfe, 0xff, 0x00, 0x61))).toBe(expected);
  });

  it("recognises UTF-16 without a byte order mark by its zero bytes on one side", () => {
    const little = new Uint8Array([..."manufacturer,part_number"].flatMap((c) => [c.charCodeAt(0), 0]));
    const big = new Uint8Array([..."manufacturer,part_number"].flatMap((c) => [0, c.charCodeAt(0)]));
    const expected = "The file is not UTF-8 text: it looks like UTF-16 (every other byte is zero). Save it as CSV UTF-8 and upload it again.";
    expect(message(little)).toBe(expected);
    expect(message(big)).toBe(expected);
  });

  it("names Latin-1 and the line of the first byte that is not UTF-8", () => {
    expect(message(new Uint8Array([...utf8("a,b\n1,"), 0xb0, 0x43]))).toBe(
      "The file is not UTF-8 text: it looks like Latin-1 or Windows-1252 (first non-UTF-8 character on line 2). Save it as CSV UTF-8 and upload it again.",
    );
  });

  it("refuses binary data, workbooks and PDF documents renamed to .csv", () => {
    expect(message(bytes(0x01, 0x00, 0x00, 0x07, 0xff, 0x00, 0x10, 0x00, 0x00, 0x00, 0x42))).toBe("The file is not a text file: it contains binary data. Upload a CSV file.");
    expect(message(bytes(0x50, 0x4b, 0x03, 0x04, 0x14))).toBe(
      "The file is not CSV text: it looks like a spreadsheet workbook (.xlsx or another ZIP archive). Save it as CSV UTF-8 and upload it again.",
    );
    expect(message(utf8("%PDF-1.7\n"))).toBe("The file is not CSV text: it is a PDF document. Upload a CSV file.");
    expect(message(bytes(0xd0, 0xcf, 0x11, 0xe0, 0xa1))).toBe("The file is not CSV text: it looks like an old Excel workbook (.xls). Save it as CSV UTF-8 and upload it again.");
    expect(message(utf8("a,b\n1\u0007,2\n"))).toBe("The file is not a text file: it contains control characters. Upload a CSV file.");
  });

  it("finds a zero byte beyond the first 4 KiB as binary", () => {
    const text = new Uint8Array(5000).fill(0x61);
    text[4500] = 0;
    expect(message(text)).toBe("The file is not a text file: it contains binary data. Upload a CSV file.");
  });
});
