import { methodNotAllowed } from "#app/lib/api.server.ts";
import { databaseAnswers } from "#app/lib/db.server.ts";
import { mailAnswers } from "#app/lib/mail.server.ts";

// Public on purpose: load balancers and the start script ask it before anyone signs in.
export async function loader() {
  const [database, mail] = await Promise.all([databaseAnswers(), mailAnswers()]);
  const ok = database && mail;
  return Response.json(
    { status: ok ? "ok" : "degraded", database: database ? "up" : "down", mail: mail ? "up" : "down" },
    { status: ok ? 200 : 503, headers: { "Cache-Control": "no-store" } },
  );
}

export const action = methodNotAllowed(["GET"]);
