import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import request from "supertest";
import { freePort, startAppServer, type RunningApp } from "../setup/app-server.ts";
import { appUrl } from "../setup/http.ts";

describe("GET /api/health", () => {
  it("answers 200 when the database and the mail server both answer", async () => {
    const response = await request(appUrl()).get("/api/health");
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: "ok", database: "up", mail: "up" });
  });

  describe("with the mail server gone", () => {
    let app: RunningApp;
    beforeAll(async () => {
      // A port with no listener stands for a mail server that is down.
      const closedPort = await freePort();
      app = await startAppServer({ DATABASE_URL: inject("databaseUrl"), SMTP_PORT: String(closedPort) }, { waitForHealthy: false });
    });
    afterAll(async () => {
      await app.stop();
    });

    it("answers 503 and says which service is down", async () => {
      const response = await request(app.url).get("/api/health");
      expect(response.status).toBe(503);
      expect(response.body).toEqual({ status: "degraded", database: "up", mail: "down" });
    });
  });
});
