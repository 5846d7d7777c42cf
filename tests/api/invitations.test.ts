/**
 * Issue 14, §3 and §5: bringing the other party in. A sender invites a receiver by e-mail, drafts
 * and sends a transfer to the pending organisation at once, and the invitee signs up from the
 * e-mailed link into that organisation and finds the transfer waiting. The directory shows only
 * organisations that chose to be listed, by name, kind, city and state.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OrganizationSchema } from "../../server/db/entities/organization.entity";
import { UserSchema } from "../../server/db/entities/user.entity";
import { buildOrganization, buildUser, FIXTURE_OVERRIDE, transferInput } from "../factories";
import { anonymousClient, createTestApp, signIn, type TestApp } from "../support/app";
import { lastMail as caughtMail, signupBody } from "../support/account";

let t: TestApp;
const em = () => t.orm.em.fork();
const lastMail = (address: string, topic?: string) => caughtMail(t.orm, address, topic);
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("inviting the other party of a transfer", () => {
  it("invites a receiver, sends it a transfer at once, and the invitee signs up into it and confirms", async () => {
    const senderUser = await buildUser(em(), { role: "manager", displayName: "Ruth Calder" });
    const sender = await signIn(t.app, senderUser.email);
    const invited = await sender.post("/api/organizations/invitations", {
      organizationName: "Heron Pond Nature Center",
      kind: "nature_centre",
      email: "animals@heronpond.example",
      state: "OR",
    });
    expect(invited.status, JSON.stringify(invited.body)).toBe(201);
    expect(invited.body).toEqual({
      organization: { id: expect.any(String), name: "Heron Pond Nature Center", pending: true },
    });
    const orgId = invited.body.organization.id as string;

    // The e-mail names who invited and why.
    const { mail, token } = await lastMail("animals@heronpond.example", "account.invite_organization");
    expect(mail?.textBody).toContain("Ruth Calder");
    await em().populate(senderUser, ["organization"]);
    expect(mail?.textBody).toContain(senderUser.organization!.getEntity().name);
    expect(mail?.textBody).toContain("send live animals to Heron Pond Nature Center");
    expect(mail?.textBody).toContain("/sign-up?invitation=");

    // The pending organisation is a receiver at once, for the sender who invited it only.
    const input = await transferInput(em(), orgId);
    const created = await sender.post("/api/transfers", input);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const transferId = created.body.transfer.id as string;
    expect((await sender.post(`/api/transfers/${transferId}/transition`, { to: "awaiting_receiver" })).status).toBe(
      200,
    );
    const other = await signIn(t.app, (await buildUser(em())).email);
    const stolen = await other.post("/api/transfers", await transferInput(em(), orgId));
    expect([stolen.status, stolen.body.error.field]).toEqual([400, "receiverOrganizationId"]);

    // The sign-up page reads the invitation: name and state filled, who invited said.
    const visitor = await anonymousClient(t.app);
    const read = await visitor.get(`/api/signup/invitation?token=${token}`);
    expect(read.status, JSON.stringify(read.body)).toBe(200);
    expect(read.body.invitation.organization).toEqual({
      name: "Heron Pond Nature Center",
      kind: "nature_centre",
      state: "OR",
    });
    expect(read.body.invitation.invitedBy.displayName).toBe("Ruth Calder");

    const body = { ...signupBody({ email: "milo@heronpond.example" }), invitation: token };
    body.organization.state = "WA"; // the invitation's name and state are kept
    expect((await visitor.post("/api/signup", body)).status).toBe(202);
    expect(await em().count(OrganizationSchema, { name: body.organization.name })).toBe(0);
    const confirm = await lastMail("milo@heronpond.example", "account.confirm_signup");
    const confirmed = await visitor.post("/api/signup/confirm", { token: confirm.token });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body.user.organization.id).toBe(orgId);
    const org = await em().findOneOrFail(OrganizationSchema, { id: orgId });
    expect([org.name, org.state, org.city, org.pending]).toEqual(["Heron Pond Nature Center", "OR", "Bend", false]);

    // The transfer is waiting; the receiver confirms it.
    const list = await visitor.get("/api/transfers");
    expect(list.body.transfers.map((x: { id: string }) => x.id)).toContain(transferId);
    const ready = await visitor.post(`/api/transfers/${transferId}/transition`, {
      to: "ready",
      override: true,
      reason: FIXTURE_OVERRIDE,
    });
    expect(ready.status, JSON.stringify(ready.body)).toBe(200);
    expect(ready.body.transfer.status).toBe("ready");

    // The invitation is single use.
    const again = await (
      await anonymousClient(t.app)
    ).post("/api/signup", {
      ...signupBody(),
      invitation: token,
    });
    expect([again.status, again.body.error.field]).toEqual([400, "invitation"]);
  });

  it("sends an existing account a link to accept instead, joining it to nothing", async () => {
    const sender = await signIn(t.app, (await buildUser(em())).email);
    const existing = await buildUser(em());
    const res = await sender.post("/api/organizations/invitations", {
      organizationName: "Kestrel Line Couriers",
      kind: "courier_service",
      email: existing.email,
      state: "KY",
    });
    expect(res.status).toBe(201);
    expect(res.body.organization.pending).toBe(true);
    const after = await em().findOneOrFail(UserSchema, { id: existing.id });
    expect(after.organization?.id).not.toBe(res.body.organization.id);
    const { mail, token } = await lastMail(existing.email, "account.join_organization");
    expect(mail?.textBody).toContain("/join?token=");
    expect(token).toBeTruthy();
  });

  it("refuses bad input and couriers with words, changing nothing", async () => {
    const sender = await signIn(t.app, (await buildUser(em())).email);
    const courier = await signIn(t.app, (await buildUser(em(), { role: "courier" })).email);
    const before = await em().count(OrganizationSchema, {});
    for (const body of [
      { organizationName: "", kind: "zoo", email: "a@b.example", state: "OR" },
      { organizationName: "X", kind: "spaceport", email: "a@b.example", state: "OR" },
      { organizationName: "X", kind: "zoo", email: "not an address", state: "OR" },
      { organizationName: "X", kind: "zoo", email: "a@b.example", state: "ZZ" },
      { organizationName: "X", kind: "zoo", email: "a@b.example", state: "OR", listed: true },
    ]) {
      const res = await sender.post("/api/organizations/invitations", body);
      expect(res.status, JSON.stringify(body)).toBe(400);
    }
    const refused = await courier.post("/api/organizations/invitations", {
      organizationName: "X",
      kind: "zoo",
      email: "a@b.example",
      state: "OR",
    });
    expect(refused.status).toBe(403);
    expect(await em().count(OrganizationSchema, {})).toBe(before);
  });
});

describe("the directory", () => {
  it("shows listed organisations by name, kind, city and state only; unlisted ones not at all", async () => {
    const listed = await buildOrganization(em(), { name: "Listed Tortoise Refuge", kind: "rescue", listed: true });
    const unlisted = await buildOrganization(em(), { name: "Quiet Gecko Keepers", kind: "private_keeper" });
    await buildUser(em(), { role: "manager", organization: listed });
    const viewer = await signIn(t.app, (await buildUser(em())).email);
    const res = await viewer.get("/api/directory/organizations");
    expect(res.status).toBe(200);
    const shown = res.body.organizations.find((o: { id: string }) => o.id === listed.id);
    expect(shown).toMatchObject({ name: listed.name, kind: "rescue", city: listed.city, state: listed.state });
    expect([shown.street, shown.zip, shown.contacts]).toEqual(["", "", []]);
    expect(res.body.organizations.some((o: { id: string }) => o.id === unlisted.id)).toBe(false);
  });
});
