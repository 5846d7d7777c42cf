import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { anonymousClient, createTestApp, signIn, type Client, type TestApp } from "../../../tests/support/app";
import { buildOrganization, buildUser } from "../../../tests/factories";
import { startSmtpFake, type SmtpFake } from "../../../fakes/smtp/smtp-fake";
import { createMailer } from "../../adapters/mailer";
import { deliverDueMail } from "../../services/outbox";
import { UserSchema } from "../../db/entities/user.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";

let t: TestApp;
let smtp: SmtpFake;
let admin: Client;
const em = () => t.orm.em.fork();

beforeAll(async () => {
  smtp = await startSmtpFake();
  t = await createTestApp({ SMTP_URL: smtp.smtpUrl });
  const a = await buildUser(em(), { role: "admin", organization: null });
  admin = await signIn(t.app, a.email);
});
afterAll(async () => {
  await t.close();
  await smtp.close();
});

const ADMIN_ROUTES: [method: "get" | "post" | "patch", path: string][] = [
  ["get", "/api/users"],
  ["post", "/api/users"],
  ["patch", "/api/users/0190a7d2-0000-7000-8000-000000000000"],
  ["get", "/api/organizations"],
  ["post", "/api/organizations"],
  // PATCH /api/organizations/:id is also for the organisation's own managers (issue 14, §2):
  // anyone else gets 404 for it, tested in tests/api/members.test.ts.
];

describe("admin routes", () => {
  it.each(["member", "courier"] as const)("are all 403 for a %s", async (role) => {
    const user = await buildUser(em(), { role });
    const client = await signIn(t.app, user.email);
    for (const [method, path] of ADMIN_ROUTES) {
      const res = method === "get" ? await client.get(path) : await client[method](path, {});
      expect({ path, method, status: res.status }).toEqual({ path, method, status: 403 });
    }
  });

  it("are all 401 for nobody signed in", async () => {
    const client = await anonymousClient(t.app);
    for (const [method, path] of ADMIN_ROUTES) {
      const res = method === "get" ? await client.get(path) : await client[method](path, {});
      expect({ path, status: res.status }).toEqual({ path, status: 401 });
    }
  });

  it("a disabled admin is refused at once", async () => {
    const other = await buildUser(em(), { role: "admin", organization: null });
    const client = await signIn(t.app, other.email);
    await t.ctx.pool.query("UPDATE app_user SET disabled = true WHERE id = $1", [other.id]);
    expect((await client.get("/api/users")).status).toBe(401);
  });
});

describe("organisations", () => {
  const valid = {
    name: "Cattail Pond Zoo",
    kind: "zoo",
    address: { street: "3 Reed Way", city: "Boise", state: "ID", zip: "83702" },
    phone: "+1 208 555 0111",
    email: "keepers@cattail.example",
  };

  it("admin creates, lists and edits one", async () => {
    const created = await admin.post("/api/organizations", valid);
    expect(created.status).toBe(201);
    expect(created.body.organization).toMatchObject({
      name: "Cattail Pond Zoo",
      address: { state: "ID", zip: "83702" },
    });
    const id = created.body.organization.id;
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-/); // UUID v7
    const list = await admin.get("/api/organizations");
    expect(list.body.organizations.map((o: { id: string }) => o.id)).toContain(id);
    const patched = await admin.patch(`/api/organizations/${id}`, { phone: "+1 208 555 0199" });
    expect(patched.status).toBe(200);
    expect(patched.body.organization.phone).toBe("+1 208 555 0199");
  });

  // The message names the field in words (shared/words/fields.ts), never by its code.
  it.each([
    [{ ...valid, kind: "aquarium" }, "kind", "Kind: choose one from the list."],
    [{ ...valid, address: { ...valid.address, state: "XX" } }, "address.state", "State: choose one from the list."],
    [{ ...valid, address: { ...valid.address, zip: "8370" } }, "address.zip", "ZIP code: enter a 5-digit ZIP code"],
    [{ ...valid, email: "not-an-email" }, "email", "E-mail address: enter an e-mail address"],
    [{ ...valid, name: "   " }, "name", "Name: fill this in."],
    [{ ...valid, name: 42 }, "name", "Name: enter it as text."],
    [{ ...valid, extra: true }, "extra", "Remove “extra”: it is not a field here."],
  ])("refuses bad input naming the field (%#)", async (body, field, words) => {
    const before = (await admin.get("/api/organizations")).body.organizations.length;
    const res = await admin.post("/api/organizations", body);
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe(field);
    expect(res.body.error.message).toContain(words);
    expect((await admin.get("/api/organizations")).body.organizations.length).toBe(before);
  });

  it("an unknown id is 404 and a malformed id is 400", async () => {
    expect(
      (await admin.patch("/api/organizations/0190a7d2-0000-7000-8000-000000000000", { phone: "+1 208 555 0199" }))
        .status,
    ).toBe(404);
    expect((await admin.patch("/api/organizations/1", { phone: "+1 208 555 0199" })).status).toBe(400);
  });
});

describe("users", () => {
  it("an invitation mails a one-time link that sets the password", async () => {
    const org = await buildOrganization(em());
    const res = await admin.post("/api/users", {
      email: "Wren.Hale@Example.test",
      displayName: "Wren Hale",
      role: "member",
      organizationId: org.id,
    });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({
      email: "Wren.Hale@Example.test",
      invitationPending: true,
      organization: { id: org.id },
    });

    // Not sent in the request: it waits in the outbox until the worker runs.
    expect(smtp.messages.find((m) => m.to.some((a) => a.toLowerCase() === "wren.hale@example.test"))).toBeUndefined();
    await deliverDueMail(t.orm, createMailer(smtp.smtpUrl, "Hatchway <no-reply@hatchway.test>"));
    // SMTP lower-cases the domain part on the way; compare addresses case-insensitively.
    const mail = await smtp.waitFor((m) => m.to.some((a) => a.toLowerCase() === "wren.hale@example.test"));
    const link = mail.text.match(/https?:\/\/\S+\/welcome\?token=(\S+)/);
    expect(link).not.toBeNull();
    const token = link![1]!;

    const anon = await anonymousClient(t.app);
    expect(
      (await anon.post("/api/auth/login", { email: "wren.hale@example.test", password: "a brand new password" }))
        .status,
    ).toBe(401);
    expect((await anon.post("/api/auth/password", { token, password: "a brand new password" })).status).toBe(204);
    expect((await anon.post("/api/auth/password", { token, password: "another new password" })).status).toBe(400);
    expect(
      (await anon.post("/api/auth/login", { email: "wren.hale@example.test", password: "a brand new password" }))
        .status,
    ).toBe(200);
  });

  it("refuses a second account for the same e-mail in another case", async () => {
    const existing = await buildUser(em());
    const res = await admin.post("/api/users", {
      email: existing.email.toUpperCase(),
      displayName: "Dup",
      role: "courier",
      organizationId: null,
    });
    expect(res.status).toBe(409);
  });

  it("refuses a short password and an expired or unknown link", async () => {
    const anon = await anonymousClient(t.app);
    const short = await anon.post("/api/auth/password", { token: "x".repeat(43), password: "short" });
    expect(short.status).toBe(400);
    expect(short.body.error.field).toBe("password");
    const unknown = await anon.post("/api/auth/password", { token: "x".repeat(43), password: "long enough password" });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.field).toBe("token");
  });

  it("admin changes a role and disables an account; the account can no longer sign in", async () => {
    const user = await buildUser(em(), { role: "member" });
    const service = await buildOrganization(em(), { kind: "courier_service" });
    const asCourier = await admin.patch(`/api/users/${user.id}`, { role: "courier", organizationId: service.id });
    expect(asCourier.status).toBe(200);
    expect(asCourier.body.user).toMatchObject({ role: "courier", organization: { id: service.id } });
    const disabled = await admin.patch(`/api/users/${user.id}`, { disabled: true });
    expect(disabled.body.user.disabled).toBe(true);
    const anon = await anonymousClient(t.app);
    expect((await anon.post("/api/auth/login", { email: user.email, password: "hatchway-demo" })).status).toBe(401);
  });

  it("lists users without any password material", async () => {
    const res = await admin.get("/api/users");
    expect(res.status).toBe(200);
    expect(res.body.users.length).toBeGreaterThan(0);
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|passwordHash|password_hash/);
  });

  // Issue 14, §2: a keeper organisation has managers and members, a courier service managers and
  // couriers (our own rule); the admin's screens may not make a person the other kind's role.
  it("keeps each role to an organisation of the kind that has it, and changes nothing when it does not fit", async () => {
    const keeper = await buildOrganization(em(), { kind: "zoo" });
    const service = await buildOrganization(em(), { kind: "courier_service" });
    const misfits = [
      { role: "courier", organizationId: keeper.id, words: /managers or members/ },
      { role: "member", organizationId: service.id, words: /managers or couriers/ },
    ];
    for (const [i, { words, ...fields }] of misfits.entries()) {
      const res = await admin.post("/api/users", {
        email: `misfit.${i}@example.test`,
        displayName: `Misfit ${i}`,
        ...fields,
      });
      expect([res.status, res.body.error.field]).toEqual([400, "organizationId"]);
      expect(res.body.error.message).toMatch(words);
    }
    expect(await em().count(UserSchema, { email: { $like: "misfit.%" } })).toBe(0);

    const member = await buildUser(em(), { role: "member", organization: keeper });
    const toCourier = await admin.patch(`/api/users/${member.id}`, { role: "courier" });
    expect([toCourier.status, toCourier.body.error.field]).toEqual([400, "role"]);
    const moved = await admin.patch(`/api/users/${member.id}`, { organizationId: service.id });
    expect([moved.status, moved.body.error.field]).toEqual([400, "organizationId"]);
    const unchanged = await em().findOneOrFail(UserSchema, { id: member.id }, { populate: ["organization"] });
    expect([unchanged.role, unchanged.organization?.id]).toEqual(["member", keeper.id]);

    // Turning the zoo into a courier service would leave its member without a fitting role.
    const kind = await admin.patch(`/api/organizations/${keeper.id}`, { kind: "courier_service" });
    expect([kind.status, kind.body.error.field]).toEqual([409, "kind"]);
    expect(kind.body.error.message).toContain(member.displayName);
    expect((await em().findOneOrFail(OrganizationSchema, { id: keeper.id })).kind).toBe("zoo");
  });
});
