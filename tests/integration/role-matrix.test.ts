// Every route so far × every kind of visitor, with the status the server must answer.
// Adding a route is one line in `rows`.
import { beforeAll, describe, expect, inject, it } from "vitest";
import { connect } from "../setup/databases.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";

type Visitor = "anonymous" | "admin" | "librarian" | "engineer" | "purchaser";
const VISITORS: Visitor[] = ["anonymous", "admin", "librarian", "engineer", "purchaser"];
type Expectation = Record<Visitor, number>;

interface Ids {
  librarianId: string;
  partId: string;
  intakeId: string;
}

interface Row {
  method: "GET" | "POST";
  path: string | ((ids: Ids) => string);
  expect: Expectation;
  /** Ends the visitor's session (sign-out): asked with a freshly signed-in agent instead of the shared one. */
  fresh?: boolean;
}

const NO_INTAKE = "00000000-0000-4000-8000-000000000000";

/** A page for these roles (admin always included): anonymous is sent to sign in, other roles get 403. */
const pageFor = (roles: Visitor[], ok = 200): Expectation =>
  Object.fromEntries(VISITORS.map((v) => [v, v === "anonymous" ? 302 : v === "admin" || roles.includes(v) ? ok : 403])) as Expectation;
/** An API route for these roles: anonymous gets 401 JSON instead of a redirect. */
const apiFor = (roles: Visitor[], ok = 200): Expectation => ({ ...pageFor(roles, ok), anonymous: 401 });
const everyone = (status: number): Expectation => Object.fromEntries(VISITORS.map((v) => [v, status])) as Expectation;
const signedIn = (status: number): Expectation => ({ ...everyone(status), anonymous: 302 });
const signedInApi = (status: number): Expectation => ({ ...everyone(status), anonymous: 401 });

const rows: Row[] = [
  { method: "GET", path: "/", expect: signedIn(200) },
  { method: "GET", path: "/sign-in", expect: { ...everyone(302), anonymous: 200 } },
  { method: "GET", path: "/sign-in/verify", expect: { ...everyone(302) } },
  { method: "GET", path: "/sign-in/link", expect: everyone(302) },
  { method: "POST", path: "/sign-out", expect: everyone(302), fresh: true },
  { method: "GET", path: "/design", expect: signedIn(200) },
  { method: "GET", path: "/people", expect: pageFor([]) },
  { method: "POST", path: "/people", expect: pageFor([], 400) },
  { method: "GET", path: (ids) => `/people/${ids.librarianId}`, expect: pageFor([]) },
  { method: "POST", path: (ids) => `/people/${ids.librarianId}`, expect: pageFor([], 400) },
  { method: "GET", path: "/people/not-a-uuid", expect: pageFor([], 404) },
  { method: "GET", path: "/catalogue", expect: signedIn(200) },
  { method: "GET", path: (ids) => `/catalogue/${ids.partId}`, expect: signedIn(200) },
  { method: "GET", path: "/catalogue/00000000-0000-4000-8000-000000000000", expect: signedIn(404) },
  { method: "GET", path: (ids) => `/catalogue/${ids.partId}/edit`, expect: pageFor(["librarian"]) },
  { method: "POST", path: (ids) => `/catalogue/${ids.partId}/edit`, expect: pageFor(["librarian"], 400) },
  { method: "GET", path: "/intakes", expect: pageFor(["librarian"]) },
  { method: "GET", path: "/intakes/new", expect: pageFor(["librarian"]) },
  { method: "GET", path: "/intakes/formats", expect: pageFor(["librarian"]) },
  { method: "GET", path: "/intakes/templates/parts", expect: pageFor(["librarian"]) },
  { method: "GET", path: "/intakes/templates/offers", expect: pageFor(["librarian"]) },
  { method: "GET", path: (ids) => `/intakes/${ids.intakeId}`, expect: pageFor(["librarian"]) },
  { method: "GET", path: (ids) => `/intakes/${ids.intakeId}/file`, expect: pageFor(["librarian"]) },
  { method: "POST", path: "/intakes/new", expect: pageFor(["librarian"], 400) },
  { method: "POST", path: (ids) => `/intakes/${ids.intakeId}`, expect: pageFor(["librarian"], 400) },
  // The demo's first intake rejected no row, so there is nothing to download (409), but only librarians learn that.
  { method: "GET", path: (ids) => `/intakes/${ids.intakeId}/rejected`, expect: pageFor(["librarian"], 409) },
  { method: "GET", path: "/api/health", expect: everyone(200) },
  { method: "GET", path: "/api/parts", expect: signedInApi(200) },
  { method: "GET", path: "/api/parts?polarity=sideways", expect: signedInApi(400) },
  { method: "GET", path: (ids) => `/api/parts/${ids.partId}`, expect: signedInApi(200) },
  { method: "GET", path: "/api/parts/not-a-uuid", expect: signedInApi(404) },
  { method: "GET", path: "/api/intakes", expect: apiFor(["librarian"]) },
  { method: "POST", path: "/api/intakes", expect: apiFor(["librarian"], 400) },
  { method: "GET", path: (ids) => `/api/intakes/${ids.intakeId}`, expect: apiFor(["librarian"]) },
  { method: "POST", path: (ids) => `/api/intakes/${ids.intakeId}/frobnicate`, expect: apiFor(["librarian"], 404) },
  { method: "POST", path: `/api/intakes/${NO_INTAKE}/commit`, expect: apiFor(["librarian"], 404) },
  { method: "POST", path: `/api/intakes/${NO_INTAKE}/discard`, expect: apiFor(["librarian"], 404) },
  { method: "POST", path: `/api/intakes/${NO_INTAKE}/rollback`, expect: apiFor(["librarian"], 404) },
  { method: "GET", path: "/no/such/page", expect: everyone(404) },
  { method: "GET", path: "/api/no-such-thing", expect: everyone(404) },
];

const agents = new Map<Visitor, Agent>();

async function freshAgent(visitor: Visitor): Promise<Agent> {
  const agent = newAgent();
  if (visitor !== "anonymous") await signIn(agent, `${visitor}@larkfield.example.com`);
  return agent;
}
let ids: Ids;

beforeAll(async () => {
  agents.set("anonymous", newAgent());
  for (const role of VISITORS.filter((v) => v !== "anonymous")) {
    const agent = newAgent();
    await signIn(agent, `${role}@larkfield.example.com`);
    agents.set(role, agent);
  }
  const sequelize = connect(inject("databaseUrl"));
  const first = async (sql: string) => ((await sequelize.query(sql))[0][0] as { id: string } | undefined)?.id ?? "missing";
  ids = {
    librarianId: await first(`SELECT id FROM users WHERE email = 'librarian@larkfield.example.com'`),
    partId: await first(`SELECT id FROM parts ORDER BY manufacturer, part_number LIMIT 1`),
    intakeId: await first(`SELECT id FROM intakes ORDER BY created_at LIMIT 1`),
  };
  await sequelize.close();
});

describe("role matrix", () => {
  for (const row of rows) {
    for (const visitor of VISITORS) {
      const label = typeof row.path === "string" ? row.path : row.path({ librarianId: ":personId", partId: ":partId", intakeId: ":intakeId" });
      it(`${row.method} ${label} as ${visitor} answers ${row.expect[visitor]}`, async () => {
        const agent = row.fresh ? await freshAgent(visitor) : agents.get(visitor)!;
        const path = typeof row.path === "string" ? row.path : row.path(ids);
        const response = row.method === "GET" ? await agent.get(path) : await agent.post(path);
        expect(response.status).toBe(row.expect[visitor]);
        if (response.status === 302 && visitor === "anonymous" && path !== "/sign-in/verify") {
          expect(new URL(response.headers.location, "http://x").pathname).toBe("/sign-in");
        }
        if (path.startsWith("/api/") && response.status >= 400) {
          expect(response.body.error.message).toEqual(expect.any(String));
        }
      });
    }
  }
});
