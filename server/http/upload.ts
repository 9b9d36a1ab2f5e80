import multer from 'multer';
import type { Request, Response } from 'express';
import { errors } from './errors';

export interface UploadedFile {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

/**
 * Reads one multipart file field (`file`) into memory under a size limit, after the
 * route's access check has passed. Too large → 413; no file → 400. The content type is
 * judged later from the bytes themselves, never from the name or the declared type.
 */
export function readUpload(req: Request, res: Response, maxBytes: number): Promise<{ file: UploadedFile; fields: Record<string, string> }> {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 64 * 1024 } }).single('file');
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (err) {
        const code = (err as { code?: string }).code;
        if (code === 'LIMIT_FILE_SIZE') return reject(errors.tooLarge(`The file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`));
        if (code && code.startsWith('LIMIT_')) return reject(errors.validation('The upload has too many parts.', [{ path: 'file', message: code }]));
        return reject(errors.validation('The upload could not be read as multipart form data.', [{ path: 'file', message: 'malformed upload' }]));
      }
      const file = (req as Request & { file?: UploadedFile }).file;
      if (!file) return reject(errors.validation('Attach the file in the form field "file".', [{ path: 'file', message: 'is required' }]));
      resolve({ file, fields: (req.body ?? {}) as Record<string, string> });
    });
  });
}

/** What the first bytes say the file is. */
export function sniff(buffer: Buffer): 'pdf' | 'zip' | 'text' | 'unknown' {
  if (buffer.subarray(0, 5).toString('latin1') === '%PDF-') return 'pdf';
  if (buffer.length >= 4 && buffer[0] === 0x50 && buffer[1] === 0x4b && buffer[2] === 0x03 && buffer[3] === 0x04) return 'zip';
  const head = buffer.subarray(0, 4096);
  if (head.includes(0)) return 'unknown';
  return 'text';
}

/** A file name fit to show and to put in a Content-Disposition header: no folders, no control characters. */
export function safeFilename(name: string, fallback: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  const clean = [...base].filter((c) => c.charCodeAt(0) > 0x1f && c !== '\u007f' && c !== '"').join('').replace(/^\.+/, '').trim().slice(0, 120);
  return clean || fallback;
}
