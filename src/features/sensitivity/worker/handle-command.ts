import type { AnalysisCommand, AnalysisReply, RunCommand } from './protocol';
import { prepareJob } from './prepare-job';

/** What the command handler needs from where it runs: the worker, the page, or a test. */
export interface HandlerContext {
  post(reply: AnalysisReply): void;
  /** lets queued messages (a cancel) in between chunks */
  pause(): Promise<void>;
  now(): number;
}

/**
 * The sensitivity worker's command handler: runs each job chunk by chunk, posts progress after
 * every chunk, and stops at the next gap between chunks once its job is cancelled. The same
 * handler runs in the worker and, where workers are unavailable, on the page.
 */
export function createCommandHandler(ctx: HandlerContext): (cmd: AnalysisCommand) => Promise<void> {
  const cancelled = new Set<number>();

  const run = async (cmd: RunCommand): Promise<void> => {
    const started = ctx.now();
    try {
      const prepared = prepareJob(cmd);
      if (!prepared.ok) {
        ctx.post({ type: 'invalid', job: cmd.job, source: prepared.source, problems: prepared.problems });
        return;
      }
      const { job } = prepared;
      let done = 0;
      ctx.post({ type: 'progress', job: cmd.job, done, total: job.total });
      while (done < job.total) {
        await ctx.pause();
        if (cancelled.has(cmd.job)) {
          ctx.post({ type: 'cancelled', job: cmd.job, done, total: job.total });
          return;
        }
        done = job.step();
        ctx.post({ type: 'progress', job: cmd.job, done, total: job.total });
      }
      ctx.post(job.finish(cmd.job, ctx.now() - started));
    } catch (error) {
      ctx.post({ type: 'failed', job: cmd.job, message: error instanceof Error ? error.message : String(error) });
    } finally {
      cancelled.delete(cmd.job);
    }
  };

  return async (cmd) => {
    switch (cmd.type) {
      case 'cancel':
        cancelled.add(cmd.job);
        return;
      case 'sweep':
      case 'swings':
      case 'breakeven':
      case 'uncertainty':
        return run(cmd);
    }
  };
}
