import { Migration } from "@mikro-orm/migrations";

export class Migration20261201220520 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "organization" ("id" uuid not null, "name" varchar(200) not null, "kind" text check ("kind" in ('breeder', 'nature_centre', 'rescue', 'zoo', 'private_keeper', 'courier_service')) not null, "street" varchar(200) not null, "city" varchar(100) not null, "state" varchar(2) not null, "zip" varchar(10) not null, "phone" varchar(40) not null, "email" varchar(254) not null, "created_at" timestamptz not null, constraint "organization_pkey" primary key ("id"));`,
    );

    this.addSql(
      `create table "outbox_message" ("id" uuid not null, "to_address" varchar(254) not null, "subject" varchar(300) not null, "text_body" text not null, "topic" varchar(100) not null, "status" text check ("status" in ('pending', 'sent', 'dead')) not null default 'pending', "attempts" int not null default 0, "next_attempt_at" timestamptz not null, "last_error" text null, "sent_at" timestamptz null, "created_at" timestamptz not null, constraint "outbox_message_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "outbox_message_status_index" on "outbox_message" ("status");`);
    this.addSql(`create index "outbox_message_next_attempt_at_index" on "outbox_message" ("next_attempt_at");`);

    this.addSql(
      `create table "app_user" ("id" uuid not null, "email" varchar(254) not null, "email_key" varchar(254) not null, "display_name" varchar(120) not null, "password_hash" varchar(255) null, "role" text check ("role" in ('admin', 'member', 'courier')) not null, "organization_id" uuid null, "disabled" boolean not null default false, "created_at" timestamptz not null, constraint "app_user_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "app_user" add constraint "app_user_email_key_unique" unique ("email_key");`);

    this.addSql(
      `create table "password_token" ("id" uuid not null, "user_id" uuid not null, "token_hash" varchar(64) not null, "expires_at" timestamptz not null, "used_at" timestamptz null, "created_at" timestamptz not null, constraint "password_token_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "password_token" add constraint "password_token_token_hash_unique" unique ("token_hash");`,
    );

    this.addSql(
      `alter table "app_user" add constraint "app_user_organization_id_foreign" foreign key ("organization_id") references "organization" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "password_token" add constraint "password_token_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade;`,
    );

    // Server-side sessions for connect-pg-simple (its own table.sql).
    this.addSql(
      `create table "session" ("sid" varchar not null collate "default", "sess" json not null, "expire" timestamp(6) not null, constraint "session_pkey" primary key ("sid"));`,
    );
    this.addSql(`create index "IDX_session_expire" on "session" ("expire");`);

    // Sign-in throttling counters for rate-limiter-flexible's Postgres store (its schema).
    this.addSql(
      `create table "auth_throttle" ("key" varchar(255) primary key, "points" integer not null default 0, "expire" bigint);`,
    );

    // Typo-tolerant search (species, organisations).
    this.addSql(`create extension if not exists pg_trgm;`);
  }
}
