import type { Route } from "./+types/parts";
import { listParts } from "#app/data/parts.server.ts";
import { requireUser } from "#app/lib/auth.server.ts";
import { parsePartListQuery } from "#app/lib/catalogue-query.ts";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const parsed = parsePartListQuery(new URL(request.url).searchParams);
  if (!parsed.ok) {
    return Response.json({ error: { code: "invalid-query", message: "Some filters are not valid.", details: parsed.fieldErrors } }, { status: 400 });
  }
  return Response.json({ query: parsed.query, ...(await listParts(parsed.query)) });
}
