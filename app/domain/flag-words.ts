// How each flag reads to a person: a short phrase in the trade's plain words and a one-line explanation.
// The identifiers stay as they are in the API and in exports; pages show these words instead (design 3).

export interface FlagWords {
  /** A few words, lower case, as a practitioner would say it. */
  label: string;
  /** One or two sentences: what was found and why it matters. */
  explanation: string;
  /** A finding about the part against the sheet ("check"), or about the quality of the datasheet data ("data"). */
  kind: "check" | "data";
}

export const FLAG_WORDS: Readonly<Record<string, FlagWords>> = {
  "gain-off-point": {
    label: "gain quoted far from this current",
    explanation: "The datasheet quotes hFE at a collector current far from the operating point, so the gain here is an extrapolation toward the safe side.",
    kind: "check",
  },
  "rating-below-supply": {
    label: "rating below the supply",
    explanation: "An absolute maximum rating (VCEO or IC max) does not clear what the circuit applies. The part would be overstressed.",
    kind: "check",
  },
  "inside-derating": {
    label: "inside the derating margin",
    explanation: "The rating clears the circuit's value but not with the margin the chosen derating policy asks for.",
    kind: "check",
  },
  "no-min-gain": {
    label: "no minimum gain quoted",
    explanation: "Only typical (or maximum) hFE is quoted; the worst case is estimated from the typical value with a stated factor.",
    kind: "data",
  },
  "single-gain-point": {
    label: "gain quoted at one current only",
    explanation: "hFE is quoted at one collector current only, so how gain changes with current is not known from the datasheet.",
    kind: "data",
  },
  "early-unknown": {
    label: "Early voltage not given",
    explanation: "No Early voltage is quoted, so output resistance and voltage gain cannot be checked.",
    kind: "data",
  },
  "stale-datasheet": {
    label: "datasheet may be out of date",
    explanation: "The datasheet revision is old or its date unknown; check for a newer one before relying on it.",
    kind: "data",
  },
  "hot-junction": {
    label: "junction runs hot",
    explanation: "At the hottest ambient the junction temperature comes too close to, or passes, its derated maximum.",
    kind: "check",
  },
  "drive-short": {
    label: "drive falls short",
    explanation: "The drive source cannot supply the base current the part needs at this collector current.",
    kind: "check",
  },
  "sat-too-high": {
    label: "saturation drop too high",
    explanation: "VCE(sat) at this current and forced gain is above the drop the sheet allows.",
    kind: "check",
  },
  "low-early-voltage": {
    label: "low Early voltage for this gain",
    explanation: "The Early voltage is low for a high-gain part, so output resistance and voltage gain fall short of what hFE suggests.",
    kind: "check",
  },
  "outside-soa": {
    label: "outside the safe operating area",
    explanation: "The operating point lies outside the part's derated DC safe operating area.",
    kind: "check",
  },
  "slow-turn-off": {
    label: "slow to turn off",
    explanation: "Storage and fall time take too large a share of the switching period.",
    kind: "check",
  },
  "noise-over-budget": {
    label: "noise over budget",
    explanation: "The stage's input-referred noise at the source resistance is above the sheet's noise budget.",
    kind: "check",
  },
};

/** The words for a flag; an identifier this table does not know yet still reads as words, not as code. */
export function flagWords(flag: string): FlagWords {
  return FLAG_WORDS[flag] ?? { label: flag.replace(/-/g, " "), explanation: "A finding on this part.", kind: "check" };
}
