import type { Orm } from "../../server/db/orm";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";

let n = 0;

/** A valid POST /api/signup body (issue 14, §1); every call a new organisation and address. */
export function signupBody(over: { email?: string; kind?: string; name?: string } = {}) {
  n += 1;
  const stamp = `${n}-${Math.random().toString(36).slice(2, 8)}`;
  return {
    organization: {
      name: over.name ?? `Fernbrook Herp Society ${stamp}`,
      kind: over.kind ?? "nature_centre",
      street: "12 Alder Way",
      city: "Bend",
      state: "OR",
      zip: "97701",
      phone: "+1 541 555 0101",
      email: `office-${stamp}@fernbrook.example`,
    },
    user: {
      email: over.email ?? `keeper-${stamp}@fernbrook.example`,
      displayName: "Rowan Pike",
      password: "a long enough secret",
    },
  };
}

/** The last e-mail the outbox holds for an address (of a topic), and the token of the link in it. */
export async function lastMail(orm: Orm, address: string, topic?: string) {
  const mails = await orm.em
    .fork()
    .find(OutboxMessageSchema, { toAddress: address, ...(topic ? { topic } : {}) }, { orderBy: { createdAt: "desc" } });
  const mail = mails[0];
  const token = mail?.textBody.match(/(?:token|invitation)=([A-Za-z0-9_-]+)/)?.[1] ?? null;
  return { mail, token, count: mails.length };
}
