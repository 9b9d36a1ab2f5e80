import { route, type RouteDef } from '../http/route';
import { idParams } from '../../src/shared/schemas/common';
import { costQuery } from '../../src/shared/schemas/boms';
import { loadExportData } from './load';
import { writeCostedBom } from './workbook';
import { exportFilename } from './filename';

export const XLSX_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export const exportRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/boms/:id/export.xlsx', access: 'export', tag: 'Cost roll', status: 200,
    summary: 'The costed BOM workbook (Summary, Lines, Offers, Stress, Notes) at a build quantity (default: planned) and costing date (default: today). Totals are live formulas over the lines.',
    params: idParams, query: costQuery,
    handler: async ({ auth, params, query, deps, res }) => {
      // Everything is read (and any 404 or 400 raised) before the first byte is sent.
      const d = await loadExportData(deps.db, auth.workspaceId, params.id, query.qty, query.date);
      res.attachment(exportFilename(d.bom.name, d.bom.revision));
      res.setHeader('Content-Type', XLSX_TYPE);
      res.setHeader('Cache-Control', 'private, no-store');
      res.status(200);
      try {
        await writeCostedBom(res, d);
      } catch (err) {
        // Headers are gone: cut the connection so the download fails instead of ending short.
        deps.logger.error({ err, bomId: params.id }, 'costed BOM export failed while streaming');
        res.destroy(err instanceof Error ? err : undefined);
      }
      return undefined;
    },
  }),
];
