// Named findings shown on parts, with the one-line explanation a practitioner needs.

export const FLAG_EXPLANATIONS: Readonly<Record<string, string>> = {
  "no-min-gain": "Only typical (or maximum) hFE is quoted; the worst case is estimated from typ with a stated factor.",
  "early-unknown": "No Early voltage is quoted, so output resistance and voltage gain cannot be checked.",
  "single-gain-point": "hFE is quoted at one collector current only; gain elsewhere is held from that point.",
  "stale-datasheet": "The datasheet revision is old or unknown; check for a newer one before relying on it.",
  "gain-off-point": "The gain is quoted at a current far from the operating point, so hFE there is an extrapolation.",
};

const CAUTION_FLAGS = new Set(["gain-off-point", "stale-datasheet"]);

export function flagLabel(flag: string): string {
  return flag === "single-gain-point" ? "single gain point" : flag;
}

export function FlagTag({ flag }: { flag: string }) {
  const tone = CAUTION_FLAGS.has(flag) ? "border-caution/40 bg-caution-soft text-caution" : "border-rule bg-paper text-ink/80";
  return (
    <span
      className={`inline-block whitespace-nowrap rounded-sm border px-1.5 py-px font-mono text-[11px] leading-4 ${tone}`}
      title={FLAG_EXPLANATIONS[flag] ?? flag}
      data-flag={flag}
    >
      {flagLabel(flag)}
    </span>
  );
}

export function FlagTags({ flags }: { flags: readonly string[] }) {
  if (flags.length === 0) return null;
  return (
    <span className="inline-flex flex-wrap gap-1">
      {flags.map((flag) => (
        <FlagTag key={flag} flag={flag} />
      ))}
    </span>
  );
}

/** Each flag with its explanation, as the part page lists them. */
export function FlagList({ flags, notes }: { flags: readonly string[]; notes?: readonly string[] }) {
  if (flags.length === 0) return <p className="text-sm text-ink/70">No data-quality findings: the datasheet values are complete.</p>;
  return (
    <ul className="space-y-1.5">
      {flags.map((flag, i) => (
        <li key={flag} className="flex items-baseline gap-3 text-sm">
          <FlagTag flag={flag} />
          <span>{notes?.[i] ?? FLAG_EXPLANATIONS[flag] ?? "A finding on this part's data."}</span>
        </li>
      ))}
    </ul>
  );
}
