// What a list says when it has nothing to show: why, and the one thing to do next.
import type { ReactNode } from "react";

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-rule bg-white px-5 py-6">
      <p className="font-medium">{title}</p>
      {children ? <div className="mt-1 text-sm text-ink/75">{children}</div> : null}
      {action ? <div className="mt-3">{action}</div> : null}
    </div>
  );
}
