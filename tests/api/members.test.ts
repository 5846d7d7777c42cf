/**
 * Issue 14, §2 and §5: an organisation runs its own people. A manager invites, changes roles
 * and disables within their own organisation only (404 elsewhere), nobody becomes site admin,
 * and an existing account is joined to nothing without accepting. OWASP ASVS 5.0 V8.2
 * (function- and object-level authorization) [memory]; SECURITY.md, "Access".
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OrganizationSchema } from "../../server/db/entities/organization.entity";
import { UserSchema } from "../../server/db/entities/user.entity";
import { buildOrganization, buildUser } from "../factories";
import { anonymousClient, createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { lastMail as caughtMail } from "../support/account";

const lastMail = (address: string, topic?: string) => caughtMail(t.orm, address, topic);

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function keeperOrganization(kind: "nature_centre" | "courier_service" = "nature_centre") {
  const org = await buildOrganization(em(), { kind });
  const manager = await buildUser(em(), { role: "manager", organization: org });
  const member = await buildUser(em(), { role: kind === "courier_service" ? "courier" : "member", organization: org });
  return { org, manager, member, as: await signIn(t.app, manager.email) };
}

describe("a manager runs their own organisation", () => {
  it("lists, invites (with an e-mail to choose a password), changes roles and disables", async () => {
    const { org, member, as } = await keeperOrganization();
    const list = await as.get(`/api/organizations/${org.id}/members`);
    expect(list.status).toBe(200);
    expect(list.body.members.map((m: { email: string }) => m.email)).toContain(member.email);

    const invited = await as.post(`/api/organizations/${org.id}/members`, {
      email: "new.volunteer@willow.example",
      displayName: "Ada Quill",
      role: "member",
    });
    expect(invited.status, JSON.stringify(invited.body)).toBe(201);
    expect(invited.body.member.role).toBe("member");
    expect(invited.body.member.organization.id).toBe(org.id);
    const { mail, token } = await lastMail("new.volunteer@willow.example", "invitation");
    expect(mail?.textBody).toContain(org.name);
    const set = await (
      await anonymousClient(t.app)
    ).post("/api/auth/password", { token, password: "volunteer secret" });
    expect(set.status).toBe(204);
    const volunteer = await signIn(t.app, "new.volunteer@willow.example", "volunteer secret");
    expect((await volunteer.get("/api/auth/me")).body.user.organization.id).toBe(org.id);

    const promoted = await as.patch(`/api/organizations/${org.id}/members/${member.id}`, { role: "manager" });
    expect([promoted.status, promoted.body.member.role]).toEqual([200, "manager"]);
    const memberClient = await signIn(t.app, member.email);
    const disabled = await as.patch(`/api/organizations/${org.id}/members/${member.id}`, { disabled: true });
    expect([disabled.status, disabled.body.member.disabled]).toEqual([200, true]);
    // A disabled person is signed out at once and cannot sign in.
    expect((await memberClient.get("/api/auth/me")).status).toBe(401);
    const login = await (
      await anonymousClient(t.app)
    ).post("/api/auth/login", { email: member.email, password: "hatchway-demo" });
    expect(login.status).toBe(401);

    const edited = await as.patch(`/api/organizations/${org.id}`, { phone: "+1 541 555 0199", listed: true });
    expect(edited.status).toBe(200);
    expect((await em().findOneOrFail(OrganizationSchema, { id: org.id })).listed).toBe(true);
  });

  it("never makes anyone site admin, and keeps roles to the organisation's kind", async () => {
    const { org, member, manager, as } = await keeperOrganization();
    for (const body of [{ role: "admin" }, { role: "courier" }]) {
      const res = await as.patch(`/api/organizations/${org.id}/members/${member.id}`, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
    }
    const self = await as.patch(`/api/organizations/${org.id}/members/${manager.id}`, { role: "admin" });
    expect(self.status).toBe(400);
    const invite = await as.post(`/api/organizations/${org.id}/members`, {
      email: "x@y.example",
      displayName: "X",
      role: "admin",
    });
    expect(invite.status).toBe(400);
    expect((await em().findOneOrFail(UserSchema, { id: manager.id })).role).toBe("manager");
    // The last manager cannot step down.
    const last = await as.patch(`/api/organizations/${org.id}/members/${manager.id}`, { role: "member" });
    expect(last.status).toBe(409);
    const couriers = await keeperOrganization("courier_service");
    const courier = await couriers.as.patch(`/api/organizations/${couriers.org.id}/members/${couriers.member.id}`, {
      role: "member",
    });
    expect(courier.status).toBe(400);
  });

  it("answers 404 for another organisation and 403 to the organisation's own non-managers", async () => {
    const mine = await keeperOrganization();
    const theirs = await keeperOrganization();
    for (const [method, path, body] of [
      ["get", `/api/organizations/${theirs.org.id}/members`, undefined],
      [
        "post",
        `/api/organizations/${theirs.org.id}/members`,
        { email: "a@b.example", displayName: "A", role: "member" },
      ],
      ["patch", `/api/organizations/${theirs.org.id}/members/${theirs.member.id}`, { disabled: true }],
      ["patch", `/api/organizations/${theirs.org.id}`, { phone: "+1 541 555 0100" }],
      ["patch", `/api/organizations/${mine.org.id}/members/${theirs.member.id}`, { disabled: true }],
    ] as const) {
      const client: Client = mine.as;
      const res = await (method === "get" ? client.get(path) : client[method](path, body));
      expect([res.status, res.body.error?.code], `${method} ${path}`).toEqual([404, "not_found"]);
    }
    expect((await em().findOneOrFail(UserSchema, { id: theirs.member.id })).disabled).toBe(false);
    const plain = await signIn(t.app, mine.member.email);
    expect((await plain.get(`/api/organizations/${mine.org.id}/members`)).status).toBe(403);
    expect(
      (await plain.patch(`/api/organizations/${mine.org.id}/members/${mine.manager.id}`, { disabled: true })).status,
    ).toBe(403);
  });

  it("joins an existing account to nothing until it accepts the e-mailed link", async () => {
    const { org, as } = await keeperOrganization();
    const elsewhere = await keeperOrganization();
    const res = await as.post(`/api/organizations/${org.id}/members`, {
      email: elsewhere.member.email,
      displayName: "Someone",
      role: "member",
    });
    expect([res.status, res.body.member, res.body.invitation.awaitingAcceptance]).toEqual([201, null, true]);
    const user = await em().findOneOrFail(UserSchema, { id: elsewhere.member.id });
    expect(user.organization?.id).toBe(elsewhere.org.id);
    const { mail, token } = await lastMail(elsewhere.member.email, "account.join_organization");
    expect(mail?.textBody).toContain(org.name);
    // Someone else cannot use it.
    const stranger = await signIn(t.app, (await buildUser(em())).email);
    expect((await stranger.post("/api/organizations/join", { token })).status).toBe(400);
    const invitee = await signIn(t.app, elsewhere.member.email);
    const accepted = await invitee.post("/api/organizations/join", { token });
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
    expect(accepted.body.user.organization.id).toBe(org.id);
    expect((await invitee.post("/api/organizations/join", { token })).status).toBe(400);
  });
});
