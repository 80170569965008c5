// The top of every page: one h1, and a line saying what the page is for.
import type { ReactNode } from "react";

export function PageTitle({ title, lead, aside }: { title: string; lead?: ReactNode; aside?: ReactNode }) {
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div className="min-w-0">
        <h1 className="text-2xl font-semibold leading-tight sm:text-[1.625rem]">{title}</h1>
        {lead ? <p className="mt-1 text-ink/75">{lead}</p> : null}
      </div>
      {aside ? <div className="shrink-0">{aside}</div> : null}
    </div>
  );
}
