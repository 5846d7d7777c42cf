import { Migration } from "@mikro-orm/migrations";

/** The e-mails each person turned off on their account page (issue 14, §2); everyone receives everything until they choose. */
export class Migration20261205103000_account_mail extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "app_user" add column "mail_opt_outs" text[] not null default '{}';`);
  }
}
