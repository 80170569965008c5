// How a file's delimiter decides its decimal mark: one table, read by the cell readers and printed on the formats page.
import type { DecimalMark } from "../quantity";

export const DELIMITERS = [",", ";", "\t", "|"] as const;
export type Delimiter = (typeof DELIMITERS)[number];

export interface NumberStyle {
  delimiter: Delimiter;
  /** How the formats page names the files. */
  files: string;
  decimalMark: DecimalMark;
  /** The rule in the librarian's words, shown on the formats page. */
  rule: string;
}

// Spreadsheets save semicolon files in locales that write decimal commas (and group digits with dots); comma files
// come from locales with decimal points; tab and bar files come from either, so neither mark may be taken for granted.
export const NUMBER_STYLES: readonly NumberStyle[] = [
  {
    delimiter: ",",
    files: "Comma-separated files",
    decimalMark: "point",
    rule: "a dot is the decimal mark. A decimal comma must be inside double quotes (\"0,65 V\"); a comma before exactly three digits (1,000) is refused as ambiguous.",
  },
  {
    delimiter: ";",
    files: "Semicolon-separated files",
    decimalMark: "comma",
    rule: "a comma is the decimal mark (0,65 V). A dot before exactly three digits (1.000, 1.500 mA) is refused as ambiguous: write 1000 or 1,5 mA.",
  },
  {
    delimiter: "\t",
    files: "Tab-separated files",
    decimalMark: "either",
    rule: "a dot or a comma is the decimal mark (0.65 V or 0,65 V), but either one before exactly three digits (1.000, 1,000) is refused as ambiguous.",
  },
  {
    delimiter: "|",
    files: "Files separated by vertical bars",
    decimalMark: "either",
    rule: "as tab-separated files.",
  },
];

const BY_DELIMITER = new Map(NUMBER_STYLES.map((style) => [style.delimiter, style]));

export function numberStyleOf(delimiter: Delimiter): NumberStyle {
  return BY_DELIMITER.get(delimiter)!;
}

/** Said once for every file: whole-number columns read digit grouping, since a count has no decimals. */
export const WHOLE_NUMBER_RULE =
  "In whole-number columns (stock, minimum order, order multiple, lead time, break quantities) digit grouping is read in any file: 12.000 and 12,000 are 12000, and the preview says so.";
