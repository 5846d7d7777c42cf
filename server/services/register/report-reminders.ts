import { LockMode } from "@mikro-orm/core";
import { todayUtc } from "@shared/compliance/expiry";
import { nextDueReport, REPORT_REMINDER_DAYS } from "@shared/register/reporting";
import { DOCUMENT_KIND_WORDS } from "@shared/words";
import type { AppContext } from "../../context";
import { PermitDocumentSchema } from "../../db/entities/compliance.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { permitReportDueMail } from "../../mail/templates";
import { enqueueMail } from "../outbox";
import type { ScheduledTask } from "../scheduler";

const DAY_MS = 86_400_000;

/**
 * E-mails the members of a permit's organisation 30 and 7 days before its yearly report is due
 * (issue 15 §3), once per due date and reminder: the permit row is claimed with SKIP LOCKED and
 * marked with the due date in the same transaction as the queued mail. A reminder missed while no
 * server ran goes out late, never twice; within 7 days only the 7-day one is sent.
 */
export async function sendReportReminders(ctx: AppContext, today = todayUtc()): Promise<number> {
  const em = ctx.orm.em.fork();
  const sent = await em.transactional(async (tx) => {
    const permits = await tx.find(
      PermitDocumentSchema,
      { reportStartMonth: { $ne: null }, reportDueMonth: { $ne: null }, reportDueDay: { $ne: null } },
      { orderBy: { id: "asc" }, limit: 500, lockMode: LockMode.PESSIMISTIC_PARTIAL_WRITE },
    );
    let count = 0;
    for (const permit of permits) {
      const plan = {
        startMonth: permit.reportStartMonth!,
        dueMonth: permit.reportDueMonth!,
        dueDay: permit.reportDueDay!,
      };
      const report = nextDueReport(plan, today);
      const daysLeft = Math.round((Date.parse(report.dueOn) - Date.parse(today)) / DAY_MS);
      const [thirty, seven] = REPORT_REMINDER_DAYS;
      let which: 30 | 7 | null = null;
      if (daysLeft <= seven && String(permit.reportReminded7For ?? "") !== report.dueOn) which = 7;
      else if (daysLeft <= thirty && daysLeft > seven && String(permit.reportReminded30For ?? "") !== report.dueOn)
        which = 30;
      if (!which) continue;
      const organization = await tx.findOneOrFail(OrganizationSchema, { id: permit.organization.id });
      const members = await tx.find(UserSchema, {
        organization: organization.id,
        role: { $in: ["manager", "member"] },
        disabled: false,
      });
      for (const member of members)
        enqueueMail(
          tx,
          permitReportDueMail({
            to: member.email,
            name: member.displayName,
            organization: organization.name,
            kind: DOCUMENT_KIND_WORDS[permit.kind],
            number: permit.number,
            from: report.from,
            to_: report.to,
            dueOn: report.dueOn,
            daysLeft,
            link: ctx.links.to(`/register/report?permitId=${permit.id}&from=${report.from}&to=${report.to}`),
          }),
        );
      if (which === 7) {
        permit.reportReminded7For = report.dueOn;
        permit.reportReminded30For = report.dueOn;
      } else permit.reportReminded30For = report.dueOn;
      count += 1;
    }
    await tx.flush();
    return count;
  });
  if (sent > 0) ctx.kickOutbox();
  return sent;
}

export const REPORT_REMINDER_TASK = "register.report-reminders";

export const reportReminderTask: ScheduledTask = Object.freeze({
  name: REPORT_REMINDER_TASK,
  everyMs: 60 * 60 * 1000,
  run: (ctx: AppContext) => sendReportReminders(ctx).then(() => undefined),
});
