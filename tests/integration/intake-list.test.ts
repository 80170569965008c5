// The intakes list pages through every intake (issue item 18: it stopped at the newest 500).
import type { Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { connect } from "../setup/databases.ts";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { LIBRARIAN } from "../setup/intake-helpers.ts";

let agent: Agent;
let sequelize: Sequelize;

beforeAll(async () => {
  agent = newAgent();
  await signIn(agent, LIBRARIAN);
  sequelize = connect(inject("databaseUrl"));
});

afterAll(async () => {
  await sequelize.close();
});

describe("intakes list", () => {
  it("reaches the oldest of more than 500 intakes, page by page", async () => {
    // 520 old discarded intakes, written straight into the table (uploading each would only slow the test down).
    await sequelize.query(
      `INSERT INTO intakes (id, kind, file_name, size_bytes, file_bytes, uploaded_by, state, created_at, updated_at)
       SELECT gen_random_uuid(), 'parts', 'pagewell-' || lpad(n::text, 3, '0') || '.csv', 1, '\\x41', u.id, 'discarded',
              timestamptz '2020-01-01' + n * interval '1 minute', now()
       FROM generate_series(1, 520) AS n, (SELECT id FROM users WHERE email = $1) AS u`,
      { bind: [LIBRARIAN] },
    );
    const first = await agent.get("/api/intakes");
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ page: 1, pageSize: 50 });
    expect(first.body.total).toBeGreaterThanOrEqual(520);
    const lastPage = Math.ceil(first.body.total / first.body.pageSize);
    const last = await agent.get("/api/intakes").query({ page: lastPage });
    expect(last.body.intakes.at(-1)).toMatchObject({ fileName: "pagewell-001.csv", state: "discarded" });
    const seen = new Set<string>();
    for (let page = 1; page <= lastPage; page += 1) {
      for (const intake of (await agent.get("/api/intakes").query({ page })).body.intakes as Array<{ id: string }>) seen.add(intake.id);
    }
    expect(seen.size).toBe(first.body.total);

    const html = await agent.get("/intakes").query({ page: 2 });
    expect(html.status).toBe(200);
    expect(html.text).toContain(`Page 2 of ${lastPage}`);
    expect(html.text).toContain('href="/intakes?page=3"');
    expect((await agent.get("/api/intakes").query({ page: "zero" })).status).toBe(400);
  });
});
