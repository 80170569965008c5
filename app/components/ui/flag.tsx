// A flag as Betasift shows it: a notched pennant mark and a phrase in words. The explanation opens on click,
// tap, Enter or Space (a native disclosure), never on hover alone. The identifier rides along for scripts.
import { flagWords } from "#app/domain/flag-words.ts";

function PennantMark({ kind }: { kind: "check" | "data" }) {
  return (
    <svg width="10" height="12" viewBox="0 0 10 12" aria-hidden="true" focusable="false" className="shrink-0">
      <line x1="1" y1="0.5" x2="1" y2="11.5" stroke="currentColor" strokeWidth="1.3" />
      <path d="M1.6 1 L9 3.5 L5.5 4.5 L9 6.5 L1.6 6.5 Z" fill={kind === "check" ? "currentColor" : "none"} stroke="currentColor" strokeWidth="1" />
    </svg>
  );
}

export function FlagChip({ flag, explanation }: { flag: string; explanation?: string }) {
  const words = flagWords(flag);
  const tone = words.kind === "check" ? "border-caution/40 bg-caution-soft text-caution" : "border-rule bg-paper text-ink/80";
  return (
    <details className="group inline-block align-middle" data-flag={flag}>
      <summary
        className={`inline-flex cursor-pointer list-none items-center gap-1.5 rounded-sm border px-1.5 py-px text-xs leading-5 ${tone} [&::-webkit-details-marker]:hidden`}
      >
        <PennantMark kind={words.kind} />
        <span>{words.label}</span>
      </summary>
      <p className="mt-1 max-w-xs rounded-sm border border-rule bg-white px-2 py-1.5 text-xs leading-5 text-ink shadow-sm">
        {explanation ?? words.explanation}
      </p>
    </details>
  );
}

export function FlagChips({ flags }: { flags: readonly string[] }) {
  if (flags.length === 0) return null;
  return (
    <span className="inline-flex flex-wrap gap-1">
      {flags.map((flag) => (
        <FlagChip key={flag} flag={flag} />
      ))}
    </span>
  );
}

/** Each flag with its explanation written out, as a part's page lists them. */
export function FlagNotes({ flags, notes, emptyText }: { flags: readonly string[]; notes?: readonly string[]; emptyText: string }) {
  if (flags.length === 0) return <p className="text-sm text-ink/70">{emptyText}</p>;
  return (
    <ul className="space-y-2">
      {flags.map((flag, i) => {
        const words = flagWords(flag);
        return (
          <li key={flag} className="flex items-start gap-2 text-sm" data-flag={flag}>
            <span className={`mt-1 ${words.kind === "check" ? "text-caution" : "text-ink/70"}`}>
              <PennantMark kind={words.kind} />
            </span>
            <span>
              <span className="font-medium">{words.label}</span>
              <span className="text-ink/80">: {notes?.[i] ?? words.explanation}</span>
            </span>
          </li>
        );
      })}
    </ul>
  );
}
