import type { InputHTMLAttributes } from "react";

export function TextField({
  label,
  name,
  error,
  hint,
  ...input
}: { label: string; name: string; error?: string; hint?: string } & InputHTMLAttributes<HTMLInputElement>) {
  const describedBy = error ? `${name}-error` : hint ? `${name}-hint` : undefined;
  return (
    <label className="block">
      <span className="block text-sm font-medium">{label}</span>
      <input
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`mt-1 block w-full rounded border bg-white px-3 py-2 text-base ${error ? "border-fault" : "border-rule"}`}
        {...input}
      />
      {error ? (
        <span id={`${name}-error`} className="mt-1 block text-sm text-fault">
          {error}
        </span>
      ) : hint ? (
        <span id={`${name}-hint`} className="mt-1 block text-sm text-ink/70">
          {hint}
        </span>
      ) : null}
    </label>
  );
}

const BUTTON_LOOKS = {
  primary: "bg-signal font-medium text-white hover:bg-signal/90",
  secondary: "border border-rule bg-white hover:bg-paper",
  danger: "border border-fault text-fault hover:bg-fault-soft",
} as const;

/** The one button: primary for the page's main action, secondary for the rest, danger for what cannot be undone. */
export function Button({ children, look = "primary", className = "", ...props }: React.ButtonHTMLAttributes<HTMLButtonElement> & { look?: keyof typeof BUTTON_LOOKS }) {
  return (
    <button className={`rounded px-4 py-2 disabled:opacity-60 ${BUTTON_LOOKS[look]} ${className}`} {...props}>
      {children}
    </button>
  );
}

export function Notice({ tone, children }: { tone: "info" | "caution" | "fault"; children: React.ReactNode }) {
  const styles = {
    info: "border-signal/30 bg-signal-soft",
    caution: "border-caution/30 bg-caution-soft",
    fault: "border-fault/30 bg-fault-soft",
  }[tone];
  return (
    <div role={tone === "fault" ? "alert" : "status"} className={`rounded border px-4 py-3 text-sm ${styles}`}>
      {children}
    </div>
  );
}
