import { Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/list";
import { CountsInline, StateTag } from "#app/components/intake/intake-parts.tsx";
import { formatBytes, formatWhen } from "#app/components/ui/format.ts";
import { listIntakes } from "#app/data/intakes.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const PageSchema = z.object({ page: z.coerce.number().int().min(1).max(1_000_000).catch(1) });

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const { page } = PageSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return listIntakes(page);
}

export const meta: Route.MetaFunction = () => [{ title: "Intakes · Betasift" }];

export default function Intakes({ loaderData }: Route.ComponentProps) {
  const { intakes, total, page, pageSize } = loaderData;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <section>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold">Intakes</h1>
          <p className="mt-1 text-ink/70">Every uploaded file of datasheet values or offers: previewed, committed, discarded or rolled back.</p>
        </div>
        <div className="flex items-center gap-4 text-sm">
          <Link to="/intakes/formats" className="text-signal underline">
            File formats
          </Link>
          <Link to="/intakes/new" className="rounded bg-signal px-4 py-2 font-medium text-white hover:bg-signal/90">
            Start an intake
          </Link>
        </div>
      </div>
      {intakes.length === 0 && total === 0 ? (
        <p className="mt-8 rounded border border-rule bg-white px-4 py-6 text-sm">
          No intake yet. <Link to="/intakes/new" className="text-signal underline">Upload a parts or offers file</Link> to start one.
        </p>
      ) : (
        <div className="mt-6 overflow-x-auto rounded border border-rule bg-white">
          <table className="w-full border-collapse text-sm" data-testid="intakes">
            <thead className="bg-paper/60">
              <tr className="border-b border-rule text-left">
                <th scope="col" className="px-3 py-2 font-medium">File</th>
                <th scope="col" className="px-3 py-2 font-medium">Kind</th>
                <th scope="col" className="px-3 py-2 font-medium">State</th>
                <th scope="col" className="px-3 py-2 font-medium">Counts</th>
                <th scope="col" className="whitespace-nowrap px-3 py-2 font-medium">Uploaded by</th>
                <th scope="col" className="px-3 py-2 text-right font-medium">Uploaded</th>
                <th scope="col" className="px-3 py-2 text-right font-medium">Committed</th>
              </tr>
            </thead>
            <tbody>
              {intakes.map((intake) => (
                <tr key={intake.id} className="border-b border-rule/60 last:border-b-0 hover:bg-signal-soft/40">
                  <td className="px-3 py-1.5">
                    <Link to={`/intakes/${intake.id}`} className="font-medium text-signal hover:underline">
                      {intake.fileName}
                    </Link>
                    <span className="ml-2 whitespace-nowrap text-xs tabular-nums text-ink/50">{formatBytes(intake.sizeBytes)}</span>
                  </td>
                  <td className="px-3 py-1.5">{intake.kind}</td>
                  <td className="px-3 py-1.5">
                    <StateTag state={intake.state} />
                  </td>
                  <td className="px-3 py-1.5 text-sm">
                    <CountsInline counts={intake.counts} />
                  </td>
                  <td className="px-3 py-1.5">{intake.uploadedBy.name}</td>
                  <td className="whitespace-nowrap px-3 py-1.5 text-right tabular-nums">{formatWhen(intake.createdAt)}</td>
                  <td className="whitespace-nowrap px-3 py-1.5 text-right tabular-nums">{intake.committedAt ? formatWhen(intake.committedAt) : "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {pages > 1 ? (
        <nav aria-label="Intake pages" className="mt-3 flex items-center justify-between text-sm">
          <span className="text-ink/70">
            {`Page ${page} of ${pages} · ${total} intakes`}
          </span>
          <span className="flex gap-3">
            {page > 1 ? (
              <Link to={`?page=${page - 1}`} className="text-signal underline">
                Newer
              </Link>
            ) : null}
            {page < pages ? (
              <Link to={`?page=${page + 1}`} className="text-signal underline">
                Older
              </Link>
            ) : null}
          </span>
        </nav>
      ) : null}
    </section>
  );
}
