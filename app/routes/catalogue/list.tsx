import { data } from "react-router";
import type { Route } from "./+types/list";
import { ActiveFilters, activeFilters, CatalogueFilters, EmptyResult, rawQueryOf } from "#app/components/catalogue/catalogue-filters.tsx";
import { CatalogueTable, Pager } from "#app/components/catalogue/catalogue-table.tsx";
import { listParts } from "#app/data/parts.server.ts";
import { requireUser } from "#app/lib/auth.server.ts";
import { defaultPartListQuery, parsePartListQuery, visibleColumns } from "#app/lib/catalogue-query.ts";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const searchParams = new URL(request.url).searchParams;
  const raw = rawQueryOf(searchParams);
  const parsed = parsePartListQuery(searchParams);
  if (!parsed.ok) {
    // The filters as typed come back with their errors; the list stays empty until they are fixed.
    const { packages } = await listParts({ ...defaultPartListQuery(), size: 10 });
    return data({ raw, fieldErrors: parsed.fieldErrors, query: defaultPartListQuery(), list: null, packages }, { status: 400 });
  }
  const list = await listParts(parsed.query);
  return { raw, fieldErrors: {} as Record<string, string>, query: parsed.query, list, packages: list.packages };
}

export const meta: Route.MetaFunction = () => [{ title: "Catalogue · Betasift" }];

export default function Catalogue({ loaderData }: Route.ComponentProps) {
  const { raw, fieldErrors, query, list, packages } = loaderData;
  const columns = visibleColumns(query);
  const filters = list ? activeFilters(query) : [];
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Catalogue</h1>
        <p className="mt-1 text-ink/70">Every part in the shared library, with its datasheet values, offers and data-quality flags. The address holds the whole view: share it to share the view.</p>
      </div>
      <CatalogueFilters raw={raw} errors={fieldErrors} packages={packages} visible={columns} />
      {list === null ? (
        <div role="alert" className="rounded border border-fault/30 bg-fault-soft px-4 py-3 text-sm">
          Some filters could not be read; they are marked above. Fix them and apply again.
        </div>
      ) : (
        <>
          <div className="flex flex-wrap items-center justify-between gap-3">
            <Pager query={query} total={list.total} />
            <ActiveFilters filters={filters} />
          </div>
          {list.total === 0 ? (
            <EmptyResult filters={filters} />
          ) : (
            <>
              <CatalogueTable rows={list.rows} columns={columns} query={query} total={list.total} />
              <Pager query={query} total={list.total} />
            </>
          )}
        </>
      )}
    </section>
  );
}
