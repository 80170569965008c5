// How names are compared: manufacturer, part number, package and supplier match when they look alike.
// The key is computed here and stored beside the name, so PostgreSQL compares keys and never folds case itself
// (its lower() follows the database's ctype, which neither folds a final sigma nor "İ" the way JavaScript does).

// Format characters that render as nothing (zero-width space and joiners, word joiner, soft hyphen, BOM, ...).
const INVISIBLE = /\p{Default_Ignorable_Code_Point}/gu;
// Hyphens and dashes that print like "-" (U+2010..U+2015, U+2212 minus sign) in names copied from PDFs.
const DASHES = /[\u2010-\u2015\u2212]/g;
const WHITESPACE = /\s+/g;
const FINAL_SIGMA = /\u03c2/g;
// Printable ASCII words with single spaces: nothing to clean, and case folding is plain lower case (the usual case,
// taken first so that a 100k-row file does not pay for Unicode normalisation it does not need).
const PLAIN_ASCII = /^[!-~]+(?: [!-~]+)*$/;

/** A name as it is stored: compatibility forms unified (NFKC), invisible characters removed, dashes as "-", spaces collapsed. */
export function cleanName(text: string): string {
  if (PLAIN_ASCII.test(text)) return text;
  return text.normalize("NFKC").replace(INVISIBLE, "").replace(DASHES, "-").replace(WHITESPACE, " ").trim();
}

/**
 * The comparison key of a name: its clean form, case-folded. Upper then lower case folds "ß" to "ss" and the
 * Greek symbol variants; final sigma becomes σ, as Unicode case folding does (CaseFolding.txt, C + F mappings).
 */
export function identityKey(text: string): string {
  if (PLAIN_ASCII.test(text)) return text.toLowerCase();
  return cleanName(text).toUpperCase().toLowerCase().replace(FINAL_SIGMA, "\u03c3").normalize("NFKC");
}
