// A verdict as Betasift shows it: a three-notch gauge and the word. The number of filled notches carries the
// verdict (three: fits, two: marginal, one and a strike: fails), so it reads without colour too.
export type VerdictName = "fits" | "marginal" | "fails";

const FILLED: Record<VerdictName, number> = { fits: 3, marginal: 2, fails: 1 };
const TONE: Record<VerdictName, string> = { fits: "text-fit", marginal: "text-caution", fails: "text-fault" };

export function VerdictMark({ verdict, size = "md" }: { verdict: VerdictName; size?: "sm" | "md" }) {
  const filled = FILLED[verdict];
  const scale = size === "sm" ? 0.8 : 1;
  return (
    <span className={`inline-flex items-center gap-1.5 font-medium ${TONE[verdict]} ${size === "sm" ? "text-xs" : "text-sm"}`} data-verdict={verdict}>
      <svg width={22 * scale} height={10 * scale} viewBox="0 0 22 10" aria-hidden="true" focusable="false">
        {[0, 1, 2].map((i) => (
          <rect
            key={i}
            x={i * 7.5}
            y={1}
            width={6}
            height={8}
            rx={1.5}
            fill={i < filled ? "currentColor" : "none"}
            stroke="currentColor"
            strokeWidth={1.2}
          />
        ))}
        {verdict === "fails" ? <line x1={0.5} y1={9.5} x2={21.5} y2={0.5} stroke="currentColor" strokeWidth={1.4} /> : null}
      </svg>
      {verdict}
    </span>
  );
}
