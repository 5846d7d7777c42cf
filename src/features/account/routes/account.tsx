import { useState, type FormEvent } from "react";
import { MAIL_CHOICES } from "@shared/constants";
import { ALWAYS_SENT_MAIL, MAIL_CHOICE_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { ApiError } from "@/lib/api-client";
import { useAccount, useChangePassword, useUpdateAccount } from "../api/account";

const messageOf = (error: unknown) => (error instanceof ApiError ? error.message : "That did not work. Try again.");

/** One's own account (issue 14, §2): name, password, e-mail choices (safety alerts always sent). */
export function AccountRoute() {
  const account = useAccount();
  if (!account.data) return <Loading label="Opening your account…" />;
  return (
    <div className="grid max-w-2xl gap-6">
      <PageHeader title="Your account">{account.data.email}</PageHeader>
      <NameCard name={account.data.displayName} />
      <PasswordCard />
      <MailCard mail={account.data.mail} />
    </div>
  );
}

function NameCard({ name }: { name: string }) {
  const [displayName, setDisplayName] = useState(name);
  const update = useUpdateAccount();
  return (
    <Card title="Name">
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          update.mutate({ displayName });
        }}
      >
        {update.error ? <Notice tone="block">{messageOf(update.error)}</Notice> : null}
        {update.isSuccess ? <Notice tone="ok">Saved.</Notice> : null}
        <TextField label="Your name" value={displayName} onChange={(e) => setDisplayName(e.target.value)} />
        <Button type="submit" variant="secondary" busy={update.isPending}>
          Save the name
        </Button>
      </form>
    </Card>
  );
}

function PasswordCard() {
  const [currentPassword, setCurrent] = useState("");
  const [newPassword, setNew] = useState("");
  const change = useChangePassword();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    change.mutate({ currentPassword, newPassword }, { onSuccess: () => (setCurrent(""), setNew("")) });
  };
  const field = change.error instanceof ApiError ? change.error.field : undefined;
  return (
    <Card title="Password">
      <form className="flex flex-col gap-3" onSubmit={submit} noValidate>
        {change.isSuccess ? <Notice tone="ok">Password changed. You were signed out everywhere else.</Notice> : null}
        {change.error && !field ? <Notice tone="block">{messageOf(change.error)}</Notice> : null}
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          value={currentPassword}
          error={field === "currentPassword" ? messageOf(change.error) : undefined}
          onChange={(e) => setCurrent(e.target.value)}
        />
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          value={newPassword}
          error={field === "newPassword" ? messageOf(change.error) : undefined}
          onChange={(e) => setNew(e.target.value)}
        />
        <Button type="submit" variant="secondary" busy={change.isPending}>
          Change the password
        </Button>
      </form>
    </Card>
  );
}

function MailCard({ mail }: { mail: Record<(typeof MAIL_CHOICES)[number], boolean> }) {
  const update = useUpdateAccount();
  return (
    <Card title="E-mails">
      <div className="flex flex-col gap-3">
        {MAIL_CHOICES.map((choice) => (
          <label key={choice} className="flex min-h-11 items-center gap-3">
            <input
              type="checkbox"
              className="h-5 w-5 shrink-0"
              checked={mail[choice]}
              disabled={update.isPending}
              onChange={(e) => update.mutate({ mail: { [choice]: e.target.checked } })}
            />
            {MAIL_CHOICE_WORDS[choice]}
          </label>
        ))}
        <p className="text-sm text-ink-soft">{ALWAYS_SENT_MAIL}</p>
        {update.error ? <Notice tone="block">{messageOf(update.error)}</Notice> : null}
      </div>
    </Card>
  );
}
