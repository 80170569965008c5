import { beforeAll, describe, expect, inject, it } from "vitest";
import { connect } from "../setup/databases.ts";
import { newAgent, pathOf, signIn, type Agent } from "../setup/http.ts";

async function personIdOf(email: string): Promise<string> {
  const sequelize = connect(inject("databaseUrl"));
  try {
    const [rows] = await sequelize.query(`SELECT id FROM users WHERE email = :email`, { replacements: { email } });
    return (rows[0] as { id: string }).id;
  } finally {
    await sequelize.close();
  }
}

describe("people admin", () => {
  let admin: Agent;

  beforeAll(async () => {
    admin = newAgent();
    await signIn(admin, "admin@larkfield.example.com");
  });

  it("invites a person with roles, who can then sign in and sees what the roles allow", async () => {
    const invited = await admin
      .post("/people")
      .type("form")
      .send({ intent: "invite", email: "  New.Librarian@Larkfield.example.com ", displayName: "Ines Varga", roles: ["librarian", "engineer"] });
    expect(invited.status).toBe(200);
    expect(invited.text).toContain("new.librarian@larkfield.example.com can sign in now.");
    const list = await admin.get("/people");
    expect(list.text).toContain("Ines Varga");

    const person = newAgent();
    await signIn(person, "new.librarian@larkfield.example.com");
    const dashboard = await person.get("/");
    expect(dashboard.text).toContain("Build the catalogue");
    expect(dashboard.text).toContain("Find the right transistor");
    expect((await person.get("/people")).status).toBe(403);
  });

  it("tells what is wrong with an invitation and keeps what was typed", async () => {
    const response = await admin.post("/people").type("form").send({ intent: "invite", email: "not-an-address", displayName: "", roles: "wizard" });
    expect(response.status).toBe(400);
    expect(response.text).toContain("That is not an e-mail address");
    expect(response.text).toContain("Type the person&#x27;s name.");
    expect(response.text).toContain("Unknown role.");
    expect(response.text).toContain('value="not-an-address"');
    const taken = await admin.post("/people").type("form").send({ intent: "invite", email: "engineer@larkfield.example.com", displayName: "Again", roles: "engineer" });
    expect(taken.status).toBe(400);
    expect(taken.text).toContain("engineer@larkfield.example.com already has an account");
  });

  it("changes roles, and refuses to remove the last admin", async () => {
    const purchaserId = await personIdOf("purchaser@larkfield.example.com");
    const changed = await admin.post(`/people/${purchaserId}`).type("form").send({ intent: "roles", roles: ["purchaser", "engineer"] });
    expect(changed.status).toBe(200);
    expect(changed.text).toContain("Roles saved.");
    await admin.post(`/people/${purchaserId}`).type("form").send({ intent: "roles", roles: ["purchaser"] });

    const adminId = await personIdOf("admin@larkfield.example.com");
    const refused = await admin.post(`/people/${adminId}`).type("form").send({ intent: "roles", roles: ["engineer"] });
    expect(refused.status).toBe(400);
    expect(refused.text).toContain("Betasift needs at least one active admin");
    const selfDeactivate = await admin.post(`/people/${adminId}`).type("form").send({ intent: "deactivate" });
    expect(selfDeactivate.status).toBe(400);
  });

  it("deactivates a person through the page: their session ends, and reactivation lets them back", async () => {
    await admin.post("/people").type("form").send({ intent: "invite", email: "leaving@larkfield.example.com", displayName: "Otto Lind", roles: "purchaser" });
    const person = newAgent();
    await signIn(person, "leaving@larkfield.example.com");
    expect((await person.get("/")).status).toBe(200);

    const id = await personIdOf("leaving@larkfield.example.com");
    const deactivated = await admin.post(`/people/${id}`).type("form").send({ intent: "deactivate" });
    expect(deactivated.text).toContain("Otto Lind is deactivated and signed out everywhere.");
    expect(pathOf((await person.get("/")).headers.location)).toBe("/sign-in");

    await admin.post(`/people/${id}`).type("form").send({ intent: "reactivate" });
    const back = newAgent();
    await signIn(back, "leaving@larkfield.example.com");
    expect((await back.get("/")).status).toBe(200);
  });
});
