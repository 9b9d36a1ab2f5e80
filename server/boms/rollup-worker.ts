import type { Deps } from '../deps';
import { ROLLUP_QUEUE, refreshWorkspace } from './rollups';
import { ensureQueue } from '../jobs/queue';

/**
 * Every process that runs jobs runs this worker; pg-boss hands each refresh to one of them.
 * Every process makes sure the queue exists, since every one of them queues refreshes.
 */
export async function startRollupWorker(deps: Deps, work = true): Promise<void> {
  await deps.queue.ready;
  await ensureQueue(deps.queue.boss, ROLLUP_QUEUE, { retryLimit: 3, retryDelay: 2, expireInMinutes: 10 });
  if (!work) return;
  // A jobs process takes several workspaces at a time (a refresh waits on the database
  // much of the time); a process that also serves requests takes one.
  for (let i = 0; i < (deps.config.PROCESS_ROLE === 'jobs' ? 3 : 1); i++) await startOne(deps);
}

async function startOne(deps: Deps): Promise<void> {
  await deps.queue.boss.work<{ workspaceId: string }>(ROLLUP_QUEUE, { pollingIntervalSeconds: deps.config.JOB_POLL_SECONDS, batchSize: 1 }, async ([job]) => {
    const n = await refreshWorkspace(deps, job.data.workspaceId);
    deps.logger.debug({ workspaceId: job.data.workspaceId, refreshed: n }, 'cost roll-ups refreshed');
  });
}
