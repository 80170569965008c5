// One entry point for both intake kinds.
import { parsePartsFile, type ParseOptions, type PartsParseResult } from "./parse-parts";
import { parseOffersFile, type OffersParseResult } from "./parse-offers";
import type { IntakeKind } from "./problems";

export type AnyIntakeParseResult = PartsParseResult | OffersParseResult;

/** Parses an uploaded intake file of the given kind. */
export function parseIntakeFile(kind: IntakeKind, bytes: Uint8Array, options: ParseOptions = {}): AnyIntakeParseResult {
  return kind === "parts" ? parsePartsFile(bytes, options) : parseOffersFile(bytes, options);
}
