import { Migration } from "@mikro-orm/migrations";

/**
 * A draft is the sender's until it is sent (issue 14, §4). `first_sent_at` says when the sender
 * first sent the transfer to the receiver; a transfer sent back for changes keeps it, so the
 * receiver and the couriers keep seeing it. Existing transfers take the time of their first
 * step to "awaiting_receiver" from the custody log.
 */
export class Migration20261205100000_draft_privacy extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "transfer" add column "first_sent_at" timestamptz null;`);
    this.addSql(
      `update "transfer" t set "first_sent_at" = (
         select min(c."at") from "custody_entry" c
          where c."transfer_id" = t."id" and c."kind" = 'status_change' and c."payload"->>'to' = 'awaiting_receiver');`,
    );
  }
}
