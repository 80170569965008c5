// Wide tables scroll inside their own frame; the first column (the part, the file, the person) stays pinned.
import type { ReactNode } from "react";

export function TableFrame({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className="table-frame overflow-x-auto rounded border border-rule bg-white">
      {children}
    </div>
  );
}
