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
}

interface Row {
  method: "GET" | "POST";
  path: string | ((ids: Ids) => string);
  expect: Expectation;
}

/** A page for these roles (admin always included): anonymous is sent to sign in, other roles get 403. */
const pageFor = (roles: Visitor[], ok = 200): Expectation =>
  Object.fromEntries(VISITORS.map((v) => [v, v === "anonymous" ? 302 : v === "admin" || roles.includes(v) ? ok : 403])) as Expectation;
/** An API route for these roles: anonymous gets 401 JSON instead of a redirect. */
const apiFor = (roles: Visitor[], ok = 200): Expectation => ({ ...pageFor(roles, ok), anonymous: 401 });
const everyone = (status: number): Expectation => Object.fromEntries(VISITORS.map((v) => [v, status])) as Expectation;
const signedIn = (status: number): Expectation => ({ ...everyone(status), anonymous: 302 });

const rows: Row[] = [
  { method: "GET", path: "/", expect: signedIn(200) },
  { method: "GET", path: "/sign-in", expect: { ...everyone(302), anonymous: 200 } },
  { method: "GET", path: "/sign-in/verify", expect: { ...everyone(302) } },
  { method: "GET", path: "/people", expect: pageFor([]) },
  { method: "POST", path: "/people", expect: pageFor([], 400) },
  { method: "GET", path: (ids) => `/people/${ids.librarianId}`, expect: pageFor([]) },
  { method: "POST", path: (ids) => `/people/${ids.librarianId}`, expect: pageFor([], 400) },
  { method: "GET", path: "/people/not-a-uuid", expect: pageFor([], 404) },
  { method: "GET", path: "/api/health", expect: everyone(200) },
  { method: "GET", path: "/no/such/page", expect: everyone(404) },
  { method: "GET", path: "/api/no-such-thing", expect: everyone(404) },
];

const agents = new Map<Visitor, Agent>();
let ids: Ids;

beforeAll(async () => {
  agents.set("anonymous", newAgent());
  for (const role of VISITORS.filter((v) => v !== "anonymous")) {
    const agent = newAgent();
    await signIn(agent, `${role}@larkfield.example.com`);
    agents.set(role, agent);
  }
  const sequelize = connect(inject("databaseUrl"));
  const [found] = await sequelize.query(`SELECT id FROM users WHERE email = 'librarian@larkfield.example.com'`);
  await sequelize.close();
  ids = { librarianId: (found[0] as { id: string }).id };
});

describe("role matrix", () => {
  for (const row of rows) {
    for (const visitor of VISITORS) {
      const label = typeof row.path === "string" ? row.path : row.path({ librarianId: ":personId" });
      it(`${row.method} ${label} as ${visitor} answers ${row.expect[visitor]}`, async () => {
        const agent = agents.get(visitor)!;
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
