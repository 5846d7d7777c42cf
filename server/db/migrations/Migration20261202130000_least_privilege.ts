import { Migration } from "@mikro-orm/migrations";

/**
 * The app's login owns nothing and may only read and write rows (D18 in DEVELOPERS.md).
 * Migrations run as hatchway_owner, which owns every object; the server connects as
 * hatchway_app. Both roles are created by whoever runs the cluster (scripts/lib/postgres.ts
 * here, the README's deployment notes elsewhere).
 *
 * The rule for later migrations: a plain table gets SELECT, INSERT, UPDATE and DELETE through
 * the default privileges set here; an append-only table's migration revokes UPDATE and DELETE
 * (and grants UPDATE on named columns where a row may be completed once).
 */
export class Migration20261202130000_least_privilege extends Migration {
  override async up(): Promise<void> {
    this.addSql(`do $$ begin
      if current_user <> 'hatchway_owner' then
        raise exception 'Run the migrations as hatchway_owner, not as %: the tables must belong to the owner role (README, "Deployment").', current_user;
      end if;
      if not exists (select 1 from pg_roles where rolname = 'hatchway_app') then
        raise exception 'The login role hatchway_app does not exist: create it before migrating (README, "Deployment").';
      end if;
    end $$;`);

    // Only the owner creates objects in the schema (PostgreSQL's default from version 15 on,
    // said again for older servers, where it warns instead of failing when it cannot).
    this.addSql(`revoke create on schema public from public;`);
    this.addSql(`grant usage on schema public to hatchway_app;`);

    // Rows, and nothing else: no TRUNCATE, REFERENCES or TRIGGER, on what exists now and on
    // every table or sequence the owner creates later.
    this.addSql(`grant select, insert, update, delete on all tables in schema public to hatchway_app;`);
    this.addSql(`grant usage, select on all sequences in schema public to hatchway_app;`);
    this.addSql(
      `alter default privileges in schema public grant select, insert, update, delete on tables to hatchway_app;`,
    );
    this.addSql(`alter default privileges in schema public grant usage, select on sequences to hatchway_app;`);

    // Which migrations ran is the owner's business.
    this.addSql(`revoke all on "mikro_orm_migrations" from hatchway_app;`);

    // The evidence: rows are added, never changed or removed. Every append-only table so far
    // carries a BEFORE TRUNCATE guard (custody_entry, transfer_change, compliance_rule,
    // compliance_evaluation, compliance_override); the triggers refuse anyone who owns the
    // table, the privileges stop the app before a trigger is reached.
    this.addSql(`do $$
      declare guarded record;
      begin
        for guarded in
          select distinct c.oid::regclass as name from pg_trigger g
            join pg_class c on c.oid = g.tgrelid join pg_namespace n on n.oid = c.relnamespace
           where n.nspname = 'public' and not g.tgisinternal and (g.tgtype & 32) <> 0
        loop
          execute format('revoke update, delete on %s from hatchway_app', guarded.name);
        end loop;
      end $$;`);
    // Alerts (added by an earlier migration on another branch) are acknowledged once: the app
    // may write the acknowledgement's columns and nothing else.
    this.addSql(`do $$ begin
      if to_regclass('public.transfer_alert') is not null then
        revoke update, delete on "transfer_alert" from hatchway_app;
        grant update ("acknowledged_at", "acknowledged_by_id", "acknowledged_by_name", "acknowledgement_note")
          on "transfer_alert" to hatchway_app;
      end if;
    end $$;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter default privileges in schema public revoke all on tables from hatchway_app;`);
    this.addSql(`alter default privileges in schema public revoke all on sequences from hatchway_app;`);
    this.addSql(`revoke all on all tables in schema public from hatchway_app;`);
    this.addSql(`revoke all on all sequences in schema public from hatchway_app;`);
  }
}
