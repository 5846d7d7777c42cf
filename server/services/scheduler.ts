import type { AppContext } from "../context";

/**
 * Work that runs on a timer in every server process, but on one of them at a time. The
 * composition root lists an app's tasks in `ctx.scheduledTasks`; nothing registers itself.
 */
export type ScheduledTask = { name: string; everyMs: number; run: (ctx: AppContext) => Promise<void> };

/**
 * Runs a task once, under a PostgreSQL advisory lock named after it, so that several
 * servers never run the same task at the same time. Returns false when another holds it.
 */
export async function runTask(ctx: AppContext, name: string): Promise<boolean> {
  const task = ctx.scheduledTasks.find((candidate) => candidate.name === name);
  if (!task) throw new Error(`no scheduled task named ${name}`);
  const client = await ctx.pool.connect();
  try {
    const { rows } = await client.query<{ locked: boolean }>("SELECT pg_try_advisory_lock(hashtext($1)) AS locked", [
      `hatchway:${name}`,
    ]);
    if (!rows[0]?.locked) return false;
    try {
      await task.run(ctx);
    } finally {
      await client.query("SELECT pg_advisory_unlock(hashtext($1))", [`hatchway:${name}`]);
    }
    return true;
  } finally {
    client.release();
  }
}

/** Starts each of the app's tasks on its interval; a failing run is logged and tried next time. */
export function startScheduler(ctx: AppContext) {
  const timers = ctx.scheduledTasks.map((task) => {
    let running = false;
    const timer = setInterval(async () => {
      if (running) return;
      running = true;
      try {
        await runTask(ctx, task.name);
      } catch (err) {
        console.error(`[scheduler] ${task.name} failed; will try again`, (err as Error).message);
      } finally {
        running = false;
      }
    }, task.everyMs);
    timer.unref();
    return timer;
  });
  return { stop: () => timers.forEach((t) => clearInterval(t)) };
}
