import type { AppContext } from '../context';
import { logReason } from '../db/log-reason';
import type { Job } from '../core/feature';

/**
 * Timed work the features registered (reminders, offers that ran out, part follow-ups, thank-you mails), run in
 * turn on one beat. Each job claims its rows with FOR UPDATE SKIP LOCKED, so every app process can run it.
 */
export class Scheduler {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  constructor(
    private ctx: AppContext,
    private jobs: Job[],
  ) {}

  start(pollMs: number) {
    if (pollMs <= 0) return;
    this.timer = setInterval(() => void this.tick(), pollMs);
    this.timer.unref();
  }

  async tick() {
    if (this.running) return this.running;
    this.running = (async () => {
      for (const job of this.jobs) {
        try {
          await job.run(this.ctx);
        } catch (err) {
          this.ctx.log(`scheduled job "${job.name}" failed: ${logReason(err)}`);
        }
      }
    })().finally(() => (this.running = null));
    return this.running;
  }

  async stop() {
    if (this.timer) clearInterval(this.timer);
    await this.running;
  }
}
