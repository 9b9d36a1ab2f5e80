import type { Deps } from '../deps';
import { ROLLUP_QUEUE, refreshWorkspace } from './rollups';
import { ensureQueue } from '../jobs/queue';

/** Every app server runs this worker; pg-boss hands each refresh to one of them. */
export async function startRollupWorker(deps: Deps): Promise<void> {
  await deps.queue.ready;
  await ensureQueue(deps.queue.boss, ROLLUP_QUEUE, { retryLimit: 3, retryDelay: 2, expireInMinutes: 10 });
  await deps.queue.boss.work<{ workspaceId: string }>(ROLLUP_QUEUE, { pollingIntervalSeconds: deps.config.JOB_POLL_SECONDS, batchSize: 1 }, async ([job]) => {
    const n = await refreshWorkspace(deps, job.data.workspaceId);
    deps.logger.debug({ workspaceId: job.data.workspaceId, refreshed: n }, 'cost roll-ups refreshed');
  });
}
