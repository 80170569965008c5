// Uploading and committing the intake fixtures over HTTP, and reading back what they stored.
import { expect } from "vitest";
import { BAD_FIXTURE_EXPECTATIONS } from "#fixtures/intake/expectations.ts";
import { readIntakeFixture } from "#fixtures/intake/read-fixtures.ts";
import type { Agent } from "../../setup/http.ts";
import { operate, uploadIntake } from "../../setup/intake-helpers.ts";

/** Uploads a bad-folder fixture as its expectation's kind. */
export function uploadBadFixture(agent: Agent, name: string) {
  const expected = BAD_FIXTURE_EXPECTATIONS[name]!;
  return uploadIntake(agent, expected.kind, name, readIntakeFixture("bad", name));
}

/** Puts a fixture's accepted rows in the catalogue; a second call finds them there and changes nothing. */
export async function commitBadFixture(agent: Agent, name: string): Promise<void> {
  const preview = await uploadBadFixture(agent, name);
  expect(preview.status).toBe(201);
  if (!preview.body.canCommit) return;
  const commit = await operate(agent, preview.body.id, "commit");
  expect(commit.status, JSON.stringify(commit.body)).toBe(200);
}

/** A catalogue part by its exact manufacturer and part number, with its offers, through the API. */
export async function readPart(agent: Agent, manufacturer: string, partNumber: string) {
  const listed = await agent.get("/api/parts").query({ q: partNumber, size: 200 });
  expect(listed.status).toBe(200);
  const row = (listed.body.rows as Array<{ id: string; manufacturer: string; partNumber: string }>).find(
    (r) => r.manufacturer === manufacturer && r.partNumber === partNumber,
  );
  expect(row, `${partNumber} by ${manufacturer} in the catalogue`).toBeDefined();
  const detail = await agent.get(`/api/parts/${row!.id}`);
  expect(detail.status).toBe(200);
  return detail.body as { part: Record<string, unknown>; offers: Array<Record<string, unknown> & { supplier: string }> };
}
