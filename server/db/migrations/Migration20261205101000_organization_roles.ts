import { Migration } from "@mikro-orm/migrations";

/**
 * Organisations run their own people (issue 14, §2): a `manager` role beside `member` and
 * `courier`. Existing keeper organisations get a manager from their own people: the member who
 * has been there longest (and is not disabled) becomes it, so every organisation that has people
 * can manage them without the site administrator. Courier services keep their couriers; the
 * site administrator names their manager.
 */
export class Migration20261205101000_organization_roles extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "app_user" drop constraint if exists "app_user_role_check";`);
    this.addSql(
      `alter table "app_user" add constraint "app_user_role_check" check ("role" in ('admin', 'manager', 'member', 'courier'));`,
    );
    this.addSql(
      `update "app_user" u set "role" = 'manager'
         from (select distinct on (u2."organization_id") u2."id"
                 from "app_user" u2 join "organization" o on o."id" = u2."organization_id"
                where u2."role" = 'member' and not u2."disabled" and o."kind" <> 'courier_service'
                order by u2."organization_id", u2."created_at", u2."id") first_member
        where u."id" = first_member."id";`,
    );
  }
}
