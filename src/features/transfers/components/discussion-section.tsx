import { useState } from "react";
import type { TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { TextAreaField } from "@/components/ui/field";
import { ApiError } from "@/lib/api-client";
import { formatInstant } from "@shared/dates";
import { useMessages, usePostMessage } from "../api/messages";
import { Section } from "./section";

/** The parties' conversation about this transfer, oldest first. */
export function DiscussionSection({ transfer: t }: { transfer: TransferDto }) {
  const messages = useMessages(t.id, t.abilities.discuss);
  const post = usePostMessage(t.id);
  const [body, setBody] = useState("");
  if (!t.abilities.discuss) return null;
  return (
    <Section id="discussion" title="Conversation">
      {messages.isPending ? (
        <Loading label="Loading messages…" />
      ) : messages.error ? (
        <Notice tone="block" role="alert">
          {(messages.error as Error).message}
        </Notice>
      ) : messages.data.length === 0 ? (
        <p className="text-ink-soft">
          No messages yet. Questions about the animals, packing or timing go here, where everyone on the transfer sees
          them.
        </p>
      ) : (
        <ol className="grid gap-3" aria-label="Messages">
          {messages.data.map((m) => (
            <li key={m.id} className="rounded-md border border-rule bg-paper p-3">
              <p className="text-sm">
                <span className="font-semibold">{m.author.displayName}</span>
                {m.author.organizationName ? (
                  <span className="text-ink-soft">, {m.author.organizationName}</span>
                ) : null}
                <span className="text-ink-soft"> · {formatInstant(m.at)}</span>
              </p>
              <p className="mt-1 whitespace-pre-wrap">{m.body}</p>
            </li>
          ))}
        </ol>
      )}
      <form
        className="mt-4 grid gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (body.trim()) post.mutate(body, { onSuccess: () => setBody("") });
        }}
      >
        <TextAreaField
          label="Write a message"
          value={body}
          maxLength={4000}
          onChange={(e) => setBody(e.target.value)}
          error={post.error instanceof ApiError ? post.error.message : undefined}
        />
        <div>
          <Button type="submit" busy={post.isPending} disabled={!body.trim()}>
            Send message
          </Button>
        </div>
      </form>
    </Section>
  );
}
