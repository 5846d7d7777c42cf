import { Migration } from "@mikro-orm/migrations";

/**
 * Organisations join by themselves (issue 14, §1): an account made by a sign-up waits for its
 * e-mail address to be confirmed, and the one-time links now serve several purposes (confirming
 * a sign-up, resetting a password, accepting to join an organisation) beside the first password
 * of an invitation. Existing accounts and links keep working as they were.
 */
export class Migration20261205102000_joining extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "app_user" add column "awaiting_confirmation" boolean not null default false;`);
    this.addSql(
      `alter table "password_token" add column "purpose" text check ("purpose" in ('set_password', 'confirm_email', 'reset_password', 'join_organization')) not null default 'set_password',
         add column "organization_id" uuid null,
         add column "role" text check ("role" in ('admin', 'manager', 'member', 'courier')) null;`,
    );
    this.addSql(
      `alter table "password_token" add constraint "password_token_organization_id_foreign" foreign key ("organization_id") references "organization" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(`create index "password_token_user_id_index" on "password_token" ("user_id");`);
    // Pending: invited by a sender, or signed up and not yet confirmed. Listed: in the directory (off by default).
    this.addSql(
      `alter table "organization" add column "pending" boolean not null default false,
         add column "listed" boolean not null default false,
         add column "invited_by_id" uuid null;`,
    );
    this.addSql(
      `alter table "organization" add constraint "organization_invited_by_id_foreign" foreign key ("invited_by_id") references "organization" ("id") on update cascade on delete set null;`,
    );
  }
}
