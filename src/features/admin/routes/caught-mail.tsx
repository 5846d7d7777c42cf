import { OUTBOX_STATUS_WORDS } from "@shared/words";
import { Badge, EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { useCaughtMail } from "../api/caught-mail";
import { formatInstant } from "@shared/dates";

/** Demo only: what the local mail catcher received, and what is still waiting in the outbox. */
export function CaughtMailRoute() {
  const mail = useCaughtMail();
  return (
    <>
      <PageHeader title="Caught mail" eyebrow="Demo tools">
        In the demo, Hatchway&rsquo;s e-mail goes to a local mail catcher instead of the internet. This page shows what
        it caught.
      </PageHeader>
      {mail.isPending ? (
        <Loading />
      ) : mail.error ? (
        <Notice tone="block" role="alert">
          {(mail.error as Error).message}
        </Notice>
      ) : (
        <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
          <div className="flex flex-col gap-3">
            {mail.data.inboxError ? (
              <Notice tone="caution" title="Mail catcher unavailable">
                {mail.data.inboxError}
              </Notice>
            ) : null}
            {mail.data.messages.length === 0 ? (
              <EmptyState title="No mail caught yet">
                Invite someone or move a transfer along and the e-mail appears here.
              </EmptyState>
            ) : (
              mail.data.messages.map((m) => (
                <Card key={m.id}>
                  <p className="font-semibold">{m.subject}</p>
                  <p className="text-sm text-ink-soft">
                    To {m.to.join(", ")} · {formatInstant(m.receivedAt)}
                  </p>
                  <pre className="mt-3 whitespace-pre-wrap break-words font-sans text-sm">{m.text}</pre>
                </Card>
              ))
            )}
          </div>
          <Card title="Outbox">
            <ul className="flex flex-col gap-2 text-sm">
              {mail.data.outbox.map((o) => (
                <li key={o.id} className="flex flex-col border-b border-rule pb-2 last:border-0">
                  <span className="font-medium">{o.subject}</span>
                  <span className="text-ink-soft">{o.to}</span>
                  <span className="flex items-center gap-2">
                    <Badge tone={o.status === "sent" ? "ok" : o.status === "dead" ? "block" : "caution"}>
                      {OUTBOX_STATUS_WORDS[o.status]}
                    </Badge>
                    {o.attempts > 0 ? <span className="text-ink-faint">{o.attempts} attempt(s)</span> : null}
                  </span>
                  {o.lastError ? <span className="text-brick">{o.lastError}</span> : null}
                </li>
              ))}
            </ul>
          </Card>
        </div>
      )}
    </>
  );
}
