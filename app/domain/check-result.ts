// The shape every check returns, so the pages can explain a verdict with its formula and numbers.

export const VERDICTS = ["fits", "marginal", "fails"] as const;
export type Verdict = (typeof VERDICTS)[number];

export const FLAG_NAMES = [
  "gain-off-point",
  "rating-below-supply",
  "inside-derating",
  "no-min-gain",
  "early-unknown",
  "hot-junction",
  "drive-short",
  "sat-too-high",
  "low-early-voltage",
  "stale-datasheet",
] as const;
export type FlagName = (typeof FLAG_NAMES)[number];

export const CHECK_NAMES = [
  "gain",
  "voltage",
  "current",
  "thermal",
  "saturation",
  "drive",
  "voltage-gain",
  "bandwidth",
] as const;
export type CheckName = (typeof CHECK_NAMES)[number];

/** A number a check used, in SI base units; unit "V", "A", "W", "°C", "°C/W", "Hz", "Ω", "" ... */
export interface CheckInput {
  symbol: string;
  label: string;
  value: number;
  unit: string;
}

export interface CheckResult {
  check: CheckName;
  /** "part" for a single device, "driver" or "output" inside a pair. */
  subject: string;
  verdict: Verdict;
  /** Fractional headroom (limit - demand) / limit; below 0 when the limit is exceeded; null when not applicable. */
  margin: number | null;
  flags: FlagName[];
  formula: string;
  inputs: CheckInput[];
  /** One plain sentence a practising engineer reads. */
  summary: string;
}

const VERDICT_RANK: Record<Verdict, number> = { fits: 0, marginal: 1, fails: 2 };

/** The worst of several verdicts (fits < marginal < fails); no verdicts at all means nothing failed. */
export function worstVerdict(verdicts: Verdict[]): Verdict {
  let worst: Verdict = "fits";
  for (const verdict of verdicts) {
    if (VERDICT_RANK[verdict] > VERDICT_RANK[worst]) worst = verdict;
  }
  return worst;
}

/** Orders verdicts from best to worst, for sorting and for monotonicity tests. */
export function compareVerdicts(a: Verdict, b: Verdict): number {
  return VERDICT_RANK[a] - VERDICT_RANK[b];
}

/** Fractional headroom of a demand against a limit: (limit - demand) / limit. */
export function computeMargin(limit: number, demand: number): number {
  return (limit - demand) / limit;
}

/** One bit per flag, in FLAG_NAMES order, so numeric judgements carry flags without arrays. */
export const FLAG_BITS: Readonly<Record<FlagName, number>> = {
  "gain-off-point": 1,
  "rating-below-supply": 2,
  "inside-derating": 4,
  "no-min-gain": 8,
  "early-unknown": 16,
  "hot-junction": 32,
  "drive-short": 64,
  "sat-too-high": 128,
  "low-early-voltage": 256,
  "stale-datasheet": 512,
};

/** The flags set in a mask, in FLAG_NAMES order. */
export function flagsOfMask(mask: number): FlagName[] {
  const flags: FlagName[] = [];
  for (let i = 0; i < FLAG_NAMES.length; i += 1) if (mask & (1 << i)) flags.push(FLAG_NAMES[i]);
  return flags;
}

/** The mask of a flag list. */
export function maskOfFlags(flags: readonly FlagName[]): number {
  let mask = 0;
  for (let i = 0; i < flags.length; i += 1) mask |= FLAG_BITS[flags[i]];
  return mask;
}

/** The worse of two verdicts, without building a list. */
export function worseVerdict(a: Verdict, b: Verdict): Verdict {
  // Direct comparisons: a keyed lookup here costs more than the rest of a check's judgement.
  if (a === "fails" || b === "fits") return a;
  if (b === "fails" || a === "fits") return b;
  return a;
}

/**
 * What every check's numeric judgement carries: no strings beyond the verdict, flags as a mask of
 * FLAG_BITS. The explanation (formula, inputs, summary) is built from the input and this.
 */
export interface Judgement {
  verdict: Verdict;
  margin: number | null;
  flags: number;
}

/** The union of flag lists in first-seen order, without repeats. */
export function mergeFlags(...lists: FlagName[][]): FlagName[] {
  return [...new Set(lists.flat())];
}
