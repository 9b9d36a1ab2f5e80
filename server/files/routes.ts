import { createHash, randomUUID } from 'node:crypto';
import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams } from '../../src/shared/schemas/common';
import { scoped } from '../db/scope';
import { getOrNotFound } from '../db/versioned';
import { audit } from '../audit/repository';
import { sniff, safeFilename } from '../http/upload';

interface FileRow {
  id: string;
  partId: string;
  filename: string;
  contentType: string;
  sizeBytes: string;
  sha256: string;
  storageKey: string;
  createdAt: Date;
}
const view = (f: FileRow) => ({
  id: f.id, partId: f.partId, filename: f.filename, contentType: f.contentType, sizeBytes: Number(f.sizeBytes),
  sha256: f.sha256, createdAt: new Date(f.createdAt).toISOString(), url: `/api/files/${f.id}`,
});
const fileOut = z.object({ id: z.string(), partId: z.string(), filename: z.string(), contentType: z.string(), sizeBytes: z.number(), sha256: z.string(), createdAt: z.string(), url: z.string() });

export const fileRoutes: RouteDef[] = [
  route({
    method: 'post', path: '/api/parts/:id/files', access: 'parts.write', tag: 'Parts', status: 201, bodyKind: 'multipart',
    summary: 'Attach a datasheet (PDF, judged by its bytes) to a part; stored in the object store.',
    params: idParams, response: fileOut,
    handler: async ({ auth, params, upload, deps }) => {
      await getOrNotFound(deps.db, 'parts', auth.workspaceId, params.id, 'part');
      const { file } = upload;
      if (file.size > deps.config.MAX_DATASHEET_MB * 1024 * 1024) throw errors.tooLarge(`Datasheets are limited to ${deps.config.MAX_DATASHEET_MB} MB.`);
      if (sniff(file.buffer) !== 'pdf') throw errors.unsupported('A datasheet must be a PDF file (its content does not start like one).');
      const key = `ws/${auth.workspaceId}/parts/${params.id}/${randomUUID()}.pdf`;
      await deps.store.put(key, file.buffer, 'application/pdf');
      try {
        return await deps.db.transaction(async (trx) => {
          const [row] = await trx('part_files')
            .insert({
              workspaceId: auth.workspaceId, partId: params.id, filename: safeFilename(file.originalname, 'datasheet.pdf'),
              contentType: 'application/pdf', sizeBytes: file.size, sha256: createHash('sha256').update(file.buffer).digest('hex'),
              storageKey: key, uploadedBy: auth.userId,
            })
            .returning('*');
          await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'upload', entity: 'part_file', entityId: row.id, changes: { partId: params.id, filename: row.filename } });
          return view(row);
        });
      } catch (err) {
        await deps.store.delete(key).catch(() => undefined);
        throw err;
      }
    },
  }),
  route({
    method: 'get', path: '/api/parts/:id/files', access: 'parts.read', tag: 'Parts',
    summary: "A part's datasheets.", params: idParams, response: z.object({ items: z.array(fileOut), nextCursor: z.string().nullable() }),
    handler: async ({ auth, params, deps }) => {
      await getOrNotFound(deps.db, 'parts', auth.workspaceId, params.id, 'part');
      const rows = (await scoped(deps.db, 'part_files', auth.workspaceId).andWhere({ partId: params.id }).orderBy('id')) as FileRow[];
      return { items: rows.map(view), nextCursor: null };
    },
  }),
  route({
    method: 'get', path: '/api/files/:id', access: 'parts.read', tag: 'Parts',
    summary: 'Download a datasheet (members of its workspace only).', params: idParams,
    handler: async ({ auth, params, res, deps }) => {
      const f = await getOrNotFound<FileRow>(deps.db, 'part_files', auth.workspaceId, params.id, 'file');
      const body = await deps.store.get(f.storageKey);
      res.setHeader('Content-Type', f.contentType);
      res.setHeader('Content-Length', String(f.sizeBytes));
      res.setHeader('Content-Disposition', `attachment; filename="${f.filename.replace(/[^\x20-\x7e]/g, '_')}"`);
      res.setHeader('X-Content-Type-Options', 'nosniff');
      await new Promise<void>((resolve, reject) => {
        body.on('error', reject);
        res.on('finish', () => resolve());
        body.pipe(res);
      });
      return undefined;
    },
  }),
  route({
    method: 'delete', path: '/api/files/:id', access: 'parts.write', tag: 'Parts',
    summary: 'Remove a datasheet.', params: idParams,
    handler: async ({ auth, params, deps }) => {
      const f = await getOrNotFound<FileRow>(deps.db, 'part_files', auth.workspaceId, params.id, 'file');
      await deps.db.transaction(async (trx) => {
        await scoped(trx, 'part_files', auth.workspaceId).andWhere({ id: params.id }).delete();
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'delete', entity: 'part_file', entityId: params.id });
      });
      await deps.store.delete(f.storageKey).catch((err) => deps.logger.warn({ err }, 'stored file not deleted'));
      return undefined;
    },
  }),
];
