import { describe, expect, it } from "vitest";
import type { Actor } from "../auth/actor";
import {
  handoffAllowed,
  mayRequestTransition,
  takesPartInHandoff,
  transferAbilities,
  viewerRoleFor,
  type TransferFacts,
} from "./transfer.policy";

const org = (id: string) => ({ id, name: id, kind: "breeder" as const });
const member = (id: string, orgId: string): Actor => ({
  id,
  email: `${id}@x`,
  displayName: id,
  role: "member",
  disabled: false,
  organization: org(orgId),
});
const courier = (id: string): Actor => ({
  id,
  email: `${id}@x`,
  displayName: id,
  role: "courier",
  disabled: false,
  organization: org("couriers"),
});
const admin: Actor = { id: "adm", email: "a@x", displayName: "A", role: "admin", disabled: false, organization: null };

const facts = (over: Partial<TransferFacts> = {}): TransferFacts => ({
  status: "ready",
  senderOrganizationId: "S",
  receiverOrganizationId: "R",
  legCourierIds: ["c1", "c2"],
  handoffsDone: 0,
  everSent: true,
  ...over,
});

// Chain of custody (NIST CNSSI 4009; ASTM D4840): each custody transfer records who released
// and who received; one leg's receiver is the next leg's releaser [published].
describe("transfer policy", () => {
  it("gives each caller their role and nobody else a view", () => {
    const t = facts();
    expect(viewerRoleFor(member("s", "S"), t)).toBe("sender");
    expect(viewerRoleFor(member("r", "R"), t)).toBe("receiver");
    expect(viewerRoleFor(courier("c2"), t)).toBe("courier");
    expect(viewerRoleFor(courier("c9"), t)).toBeNull();
    expect(viewerRoleFor(member("o", "O"), t)).toBeNull();
    expect(viewerRoleFor(admin, t)).toBe("admin");
  });

  // Issue 14, §4: a draft is the sender's until it is sent; once sent it stays shared, also
  // when sent back for changes (the status is "draft" again).
  it("keeps a draft never sent from the receiver and the couriers, and not a draft sent back", () => {
    const unsent = facts({ status: "draft", everSent: false });
    expect(viewerRoleFor(member("s", "S"), unsent)).toBe("sender");
    expect(viewerRoleFor(member("r", "R"), unsent)).toBeNull();
    expect(viewerRoleFor(courier("c1"), unsent)).toBeNull();
    expect(viewerRoleFor(admin, unsent)).toBe("admin");
    expect(viewerRoleFor(member("r", "R"), facts({ status: "cancelled", everSent: false }))).toBeNull();
    const sentBack = facts({ status: "draft", everSent: true });
    expect(viewerRoleFor(member("r", "R"), sentBack)).toBe("receiver");
    expect(viewerRoleFor(courier("c1"), sentBack)).toBe("courier");
    const manager: Actor = { ...member("m", "R"), role: "manager" };
    expect(viewerRoleFor(manager, facts())).toBe("receiver");
    const courierManager: Actor = {
      ...courier("cm"),
      role: "manager",
      organization: { id: "couriers", name: "couriers", kind: "courier_service" },
    };
    expect(viewerRoleFor(courierManager, facts({ senderOrganizationId: "couriers" }))).toBeNull();
  });

  it("walks custody along the legs: pickup by leg 1, then leg 2, then the receiver", () => {
    const s = member("s", "S");
    const r = member("r", "R");
    const c1 = courier("c1");
    const c2 = courier("c2");
    expect(handoffAllowed(c1, "courier", facts({ handoffsDone: 0 }))).toBe(0);
    expect(handoffAllowed(s, "sender", facts({ handoffsDone: 0 }))).toBe(0);
    expect(handoffAllowed(c2, "courier", facts({ handoffsDone: 0 }))).toBeNull();
    const moving = { status: "in_transit" as const };
    expect(handoffAllowed(c1, "courier", facts({ ...moving, handoffsDone: 1 }))).toBe(1);
    expect(handoffAllowed(c2, "courier", facts({ ...moving, handoffsDone: 1 }))).toBe(1);
    expect(handoffAllowed(r, "receiver", facts({ ...moving, handoffsDone: 1 }))).toBeNull();
    expect(handoffAllowed(c2, "courier", facts({ ...moving, handoffsDone: 2 }))).toBe(2);
    expect(handoffAllowed(r, "receiver", facts({ ...moving, handoffsDone: 2 }))).toBe(2);
    expect(handoffAllowed(c1, "courier", facts({ ...moving, handoffsDone: 2 }))).toBeNull();
  });

  it("allows no pickup before the transfer is cleared, and nothing after delivery", () => {
    expect(handoffAllowed(courier("c1"), "courier", facts({ status: "awaiting_receiver" }))).toBeNull();
    expect(handoffAllowed(courier("c2"), "courier", facts({ status: "delivered", handoffsDone: 3 }))).toBeNull();
  });

  it("admins read but never act", () => {
    const a = transferAbilities(admin, "admin", facts({ status: "awaiting_receiver" }));
    expect(Object.entries(a).filter(([k, v]) => v === true && k !== "readCustody")).toEqual([]);
    expect(a.handOff).toBeNull();
  });

  it("only the receiver confirms and checks in; only the sender edits", () => {
    const waiting = facts({ status: "awaiting_receiver" });
    expect(transferAbilities(member("r", "R"), "receiver", waiting).confirm).toBe(true);
    expect(transferAbilities(member("s", "S"), "sender", waiting).confirm).toBe(false);
    expect(transferAbilities(member("s", "S"), "sender", waiting).edit).toBe(true);
    expect(transferAbilities(member("r", "R"), "receiver", waiting).edit).toBe(false);
    expect(
      transferAbilities(member("r", "R"), "receiver", facts({ status: "delivered", handoffsDone: 3 })).checkIn,
    ).toBe(true);
    expect(transferAbilities(courier("c2"), "courier", facts({ status: "delivered", handoffsDone: 3 })).checkIn).toBe(
      false,
    );
  });

  it("a delivery the courier recorded alone waits for the receiver: only the receiver, or the last courier with a code, acknowledges", () => {
    // NIST CNSSI 4009 / ASTM D4840: the receiver acknowledges each transfer of custody [published].
    const awaiting = facts({ status: "in_transit", handoffsDone: 3 });
    const r = transferAbilities(member("r", "R"), "receiver", awaiting);
    expect(r).toMatchObject({ acknowledgeDelivery: true, showDeliveryCode: true, checkIn: false });
    expect(transferAbilities(courier("c2"), "courier", awaiting)).toMatchObject({
      acknowledgeDelivery: false,
      enterDeliveryCode: true,
    });
    expect(transferAbilities(courier("c1"), "courier", awaiting).enterDeliveryCode).toBe(false);
    expect(transferAbilities(member("s", "S"), "sender", awaiting).acknowledgeDelivery).toBe(false);
    const onTheWay = facts({ status: "in_transit", handoffsDone: 2 });
    expect(transferAbilities(member("r", "R"), "receiver", onTheWay)).toMatchObject({
      acknowledgeDelivery: false,
      showDeliveryCode: true,
    });
    expect(transferAbilities(courier("c2"), "courier", onTheWay).enterDeliveryCode).toBe(false);
  });
});

// Denials before state checks: what a role may ever do does not depend on the state (SECURITY.md, Access).
describe("what a role may ever do", () => {
  it("only the sender sends and cancels, only the receiver confirms, couriers and admins move nothing", () => {
    for (const to of ["awaiting_receiver", "cancelled"] as const) {
      expect(mayRequestTransition("sender", to)).toBe(true);
      expect(mayRequestTransition("receiver", to)).toBe(false);
    }
    expect(mayRequestTransition("receiver", "ready")).toBe(true);
    expect(mayRequestTransition("sender", "ready")).toBe(false);
    for (const to of ["draft", "ready", "closed", "cancelled"] as const) {
      expect(mayRequestTransition("courier", to)).toBe(false);
      expect(mayRequestTransition("admin", to)).toBe(false);
    }
  });
  it("each handoff has its two parties, whatever has been recorded", () => {
    const t = facts({ handoffsDone: 2, status: "in_transit" });
    expect(takesPartInHandoff(member("s", "S"), "sender", t, 0)).toBe(true);
    expect(takesPartInHandoff(member("s", "S"), "sender", t, 1)).toBe(false);
    expect(takesPartInHandoff(courier("c1"), "courier", t, 0)).toBe(true);
    expect(takesPartInHandoff(courier("c1"), "courier", t, 1)).toBe(true);
    expect(takesPartInHandoff(courier("c1"), "courier", t, 2)).toBe(false);
    expect(takesPartInHandoff(courier("c2"), "courier", t, 0)).toBe(false);
    expect(takesPartInHandoff(member("r", "R"), "receiver", t, 2)).toBe(true);
    expect(takesPartInHandoff(member("r", "R"), "receiver", facts({ legCourierIds: [] }), 0)).toBe(false);
    expect(takesPartInHandoff(admin, "admin", t, 0)).toBe(false);
  });
});
