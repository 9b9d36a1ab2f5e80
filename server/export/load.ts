import type { Knex } from 'knex';
import { HttpError } from '../http/errors';
import { getBom, type BomRow } from '../boms/repository';
import { costOf, type CostView } from '../boms/cost';
import { loadCostingData, type CostingData } from '../boms/inputs';
import { stressOf } from '../stress/service';

export type StressView = Awaited<ReturnType<typeof stressOf>>;

/** Everything the costed BOM workbook shows, read at one moment. */
export interface ExportData {
  bom: BomRow;
  cost: CostView;
  data: CostingData;
  /** Null when the stress check cannot run; `stressProblem` says why. */
  stress: StressView | null;
  stressProblem: string | null;
}

/**
 * Reads the BOM, its cost roll (the same call as the cost API), the parts and quotes behind
 * it and its stress check inside one read-only, repeatable-read transaction, so the sheets
 * agree with each other even while someone edits the BOM.
 */
export async function loadExportData(db: Knex, workspaceId: string, bomId: string, qty?: number, date?: string): Promise<ExportData> {
  return db.transaction(
    async (trx) => {
      const bom = await getBom(trx, workspaceId, bomId);
      const cost = await costOf(trx, workspaceId, bom, qty, date);
      const data = await loadCostingData(trx, workspaceId, bom, cost.date);
      let stress: StressView | null = null;
      let stressProblem: string | null = null;
      try {
        stress = await stressOf(trx, workspaceId, bom);
      } catch (err) {
        // A workspace without a stress policy still gets its costed BOM.
        if (!(err instanceof HttpError) || err.code !== 'conflict') throw err;
        stressProblem = err.message;
      }
      return { bom, cost, data, stress, stressProblem };
    },
    { isolationLevel: 'repeatable read', readOnly: true },
  );
}
