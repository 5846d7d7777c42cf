import { Migration } from "@mikro-orm/migrations";

/**
 * A sender invites the other party of a transfer by e-mail (issue 14, §3): the invitation is a
 * one-time link for an organisation that has nobody yet, so a link need not belong to an account,
 * and it names who sent it.
 */
export class Migration20261205104000_organization_invitations extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "password_token" alter column "user_id" drop not null;`);
    this.addSql(`alter table "password_token" drop constraint if exists "password_token_purpose_check";`);
    this.addSql(
      `alter table "password_token" add constraint "password_token_purpose_check" check ("purpose" in ('set_password', 'confirm_email', 'reset_password', 'join_organization', 'invite_organization'));`,
    );
    this.addSql(`alter table "password_token" add column "invited_by_id" uuid null;`);
    this.addSql(
      `alter table "password_token" add constraint "password_token_invited_by_id_foreign" foreign key ("invited_by_id") references "app_user" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "password_token" add constraint "password_token_user_or_invitation" check ("user_id" is not null or "purpose" = 'invite_organization');`,
    );
  }
}
