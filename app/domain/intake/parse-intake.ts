// One entry point for both intake kinds.
import type { PartsParseResult } from "./parse-parts";
import { parsePartsFile } from "./parse-parts";
import { parseOffersFile, type OffersParseResult } from "./parse-offers";
import type { IntakeKind } from "./problems";

export type AnyIntakeParseResult = PartsParseResult | OffersParseResult;

/** Parses an uploaded intake file of the given kind. */
export function parseIntakeFile(kind: IntakeKind, bytes: Uint8Array): AnyIntakeParseResult {
  return kind === "parts" ? parsePartsFile(bytes) : parseOffersFile(bytes);
}
