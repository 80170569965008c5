// Package outlines the trade names the same way: "TO92", "to 92" and "TO-92" are one outline, as catalogues print it.

export interface PackageOutline {
  /** The outline as stored and shown. */
  name: string;
  /** Other names for the same outline. */
  aliases?: readonly string[];
  /** A generous ceiling on the continuous collector current parts in this outline are rated for (from memory). */
  maxIcAmps: number;
}

// JEDEC TO and SOT outlines common for discrete bipolar transistors (common practice); DPAK is TO-252, D2PAK TO-263.
// The current ceilings are generous upper ends of what parts in each outline are rated for, recalled without a source
// at hand (from memory): they only flag an IC max typed in the wrong unit, never judge a part.
export const PACKAGE_OUTLINES: readonly PackageOutline[] = [
  { name: "TO-3", maxIcAmps: 100 },
  { name: "TO-5", maxIcAmps: 5 },
  { name: "TO-18", maxIcAmps: 2 },
  { name: "TO-39", maxIcAmps: 5 },
  { name: "TO-66", maxIcAmps: 20 },
  { name: "TO-92", maxIcAmps: 5 },
  { name: "TO-126", maxIcAmps: 10 },
  { name: "TO-202", maxIcAmps: 10 },
  { name: "TO-218", maxIcAmps: 80 },
  { name: "TO-220", maxIcAmps: 50 },
  { name: "TO-247", maxIcAmps: 100 },
  { name: "TO-252", aliases: ["DPAK"], maxIcAmps: 20 },
  { name: "TO-263", aliases: ["D2PAK"], maxIcAmps: 50 },
  { name: "TO-264", maxIcAmps: 100 },
  { name: "TO-3P", maxIcAmps: 100 },
  { name: "SOT-23", maxIcAmps: 5 },
  { name: "SOT-89", maxIcAmps: 10 },
  { name: "SOT-223", maxIcAmps: 10 },
  { name: "SOT-323", maxIcAmps: 2 },
  { name: "SOT-363", maxIcAmps: 2 },
  { name: "SOT-416", maxIcAmps: 1 },
  { name: "SOT-523", maxIcAmps: 1 },
];

// Letters and digits only, upper case: what is left of an outline name once spaces, hyphens and dots are dropped.
function compact(text: string): string {
  return text.normalize("NFKC").toUpperCase().replace(/[^A-Z0-9]/g, "");
}

const BY_COMPACT = new Map<string, PackageOutline>();
for (const outline of PACKAGE_OUTLINES) {
  for (const spelling of [outline.name, ...(outline.aliases ?? [])]) BY_COMPACT.set(compact(spelling), outline);
}

/** The known outline a package name stands for, or null when the table does not know it. */
export function resolvePackageOutline(text: string): string | null {
  return findPackageOutline(text)?.name ?? null;
}

// Package names repeat down a file, so their look-ups are kept (up to a few thousand names).
const FOUND = new Map<string, PackageOutline | null>();
const FOUND_LIMIT = 4096;

/** The known outline's entry for a package name, or null. */
export function findPackageOutline(text: string): PackageOutline | null {
  const known = FOUND.get(text);
  if (known !== undefined) return known;
  const outline = BY_COMPACT.get(compact(text)) ?? null;
  if (FOUND.size < FOUND_LIMIT) FOUND.set(text, outline);
  return outline;
}

/** The key packages are grouped and filtered by: the known outline's name, else the name's compact form. */
export function packageKey(text: string): string {
  return findPackageOutline(text)?.name ?? compact(text);
}
