// Turns uploaded bytes into text, or says in one sentence why the file is not UTF-8 CSV.
import { fileProblem, type IntakeProblem } from "./problems";

export type DecodeResult = { ok: true; text: string } | { ok: false; problem: IntakeProblem };

const SAVE_AS_UTF8 = "Save it as CSV UTF-8 and upload it again.";
const SNIFF_BYTES = 4096;

const utf8 = new TextDecoder("utf-8", { fatal: true, ignoreBOM: false });

/** Decodes an intake upload: UTF-8 with or without BOM; anything else is refused with the reason. */
export function decodeIntakeBytes(bytes: Uint8Array): DecodeResult {
  if (bytes.length === 0) return refuse("The file is empty.");
  if (startsWith(bytes, [0xff, 0xfe]) || startsWith(bytes, [0xfe, 0xff])) {
    return refuse(`The file is not UTF-8 text: it is UTF-16 (it starts with a UTF-16 byte order mark). ${SAVE_AS_UTF8}`);
  }
  if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])) {
    return refuse(`The file is not CSV text: it looks like a spreadsheet workbook (.xlsx or another ZIP archive). ${SAVE_AS_UTF8}`);
  }
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46])) {
    return refuse("The file is not CSV text: it is a PDF document. Upload a CSV file.");
  }
  if (startsWith(bytes, [0xd0, 0xcf, 0x11, 0xe0])) {
    return refuse(`The file is not CSV text: it looks like an old Excel workbook (.xls). ${SAVE_AS_UTF8}`);
  }
  const nulPattern = classifyNulBytes(bytes);
  if (nulPattern === "utf-16") {
    return refuse(`The file is not UTF-8 text: it looks like UTF-16 (every other byte is zero). ${SAVE_AS_UTF8}`);
  }
  if (nulPattern === "binary") return refuse("The file is not a text file: it contains binary data. Upload a CSV file.");

  let text: string;
  try {
    text = utf8.decode(bytes);
  } catch {
    const line = lineOfFirstInvalidByte(bytes);
    return refuse(`The file is not UTF-8 text: it looks like Latin-1 or Windows-1252 (first non-UTF-8 character on line ${line}). ${SAVE_AS_UTF8}`);
  }
  if (hasControlCharacters(text)) return refuse("The file is not a text file: it contains control characters. Upload a CSV file.");
  if (text.trim() === "") return refuse("The file is empty.");
  return { ok: true, text };
}

function refuse(message: string): DecodeResult {
  return { ok: false, problem: fileProblem(message) };
}

function startsWith(bytes: Uint8Array, signature: readonly number[]): boolean {
  return signature.every((byte, i) => bytes[i] === byte);
}

// UTF-16 text has zeros on one side of each byte pair (ASCII letters); binary has them scattered.
function classifyNulBytes(bytes: Uint8Array): "none" | "utf-16" | "binary" {
  const length = Math.min(bytes.length, SNIFF_BYTES);
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < length; i += 1) {
    if (bytes[i] !== 0) continue;
    if (i % 2 === 0) evenZeros += 1;
    else oddZeros += 1;
  }
  if (evenZeros + oddZeros === 0) {
    return bytes.length > SNIFF_BYTES && bytes.subarray(SNIFF_BYTES).includes(0) ? "binary" : "none";
  }
  const pairs = length / 2;
  const oneSided = (many: number, few: number) => many >= pairs * 0.3 && few <= many * 0.05;
  return oneSided(evenZeros, oddZeros) || oneSided(oddZeros, evenZeros) ? "utf-16" : "binary";
}

function lineOfFirstInvalidByte(bytes: Uint8Array): number {
  let line = 1;
  let i = 0;
  while (i < bytes.length) {
    const byte = bytes[i];
    if (byte === 0x0a) line += 1;
    const length = byte < 0x80 ? 1 : byte >= 0xc2 && byte <= 0xdf ? 2 : byte >= 0xe0 && byte <= 0xef ? 3 : byte >= 0xf0 && byte <= 0xf4 ? 4 : 0;
    if (length === 0) return line;
    for (let k = 1; k < length; k += 1) {
      const next = bytes[i + k];
      if (next === undefined || (next & 0xc0) !== 0x80) return line;
    }
    i += length;
  }
  return line;
}

// Tab, line feed and carriage return belong in CSV; other C0 controls (and DEL) mean a binary file.
const CONTROL_CHARACTER = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

function hasControlCharacters(text: string): boolean {
  return CONTROL_CHARACTER.test(text);
}
