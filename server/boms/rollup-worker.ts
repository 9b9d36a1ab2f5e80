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
  await deps.queue.boss.work<{ workspaceId: string }>(ROLLUP_QUEUE, { pollingIntervalSeconds: deps.config.JOB_POLL_SECONDS, batchSize: 1 }, async ([job]) => {
    const n = await refreshWorkspace(deps, job.data.workspaceId);
    deps.logger.debug({ workspaceId: job.data.workspaceId, refreshed: n }, 'cost roll-ups refreshed');
  });
}
