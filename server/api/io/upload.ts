/**
 * Uploads for the import routes: one file (multipart field "file", at most UPLOAD_LIMIT_BYTES, by
 * extension and MIME type) or a JSON body; either way the route gets UTF-8 text and the form fields.
 */
import type { Request, Response } from 'express';
import multer from 'multer';
import { UPLOAD_LIMIT_BYTES } from '@shared/export/requests';
import { AppError, ValidationError } from '../../lib/errors';

/** What an import accepts: file extensions and MIME types. */
export interface UploadKind {
  label: string;
  extensions: string[];
  mimeTypes: string[];
}

/** A model file (JSON). */
export const JSON_UPLOAD: UploadKind = { label: 'a .json model file', extensions: ['.json'], mimeTypes: ['application/json', 'text/json', 'text/plain', 'application/octet-stream'] };
/** A CSV table. */
export const CSV_UPLOAD: UploadKind = {
  label: 'a .csv file', extensions: ['.csv', '.txt'], mimeTypes: ['text/csv', 'text/plain', 'application/csv', 'application/vnd.ms-excel', 'application/octet-stream'],
};

/** 413: the upload is larger than allowed. */
export class UploadTooLargeError extends AppError {
  constructor() {
    super(413, 'upload_too_large', `The file is larger than ${UPLOAD_LIMIT_BYTES / 1024 / 1024} MB.`);
  }
}

/** 415: the upload is not of an accepted type. */
export class UploadTypeError extends AppError {
  constructor(kind: UploadKind, got: string) {
    super(415, 'unsupported_upload', `Expected ${kind.label}; got "${got}".`);
  }
}

/** The upload: file text (null when a JSON body was sent instead) and the text fields. */
export interface Upload {
  text: string | null;
  filename: string | null;
  fields: Record<string, unknown>;
}

function runMulter(req: Request, res: Response, kind: UploadKind): Promise<void> {
  const parser = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: UPLOAD_LIMIT_BYTES, files: 1, fields: 10, fieldSize: 64 * 1024, parts: 12 },
    fileFilter: (_req, file, done) => {
      const name = file.originalname.toLowerCase();
      const extOk = kind.extensions.some((e) => name.endsWith(e));
      const typeOk = kind.mimeTypes.includes(file.mimetype.toLowerCase());
      if (extOk && typeOk) done(null, true);
      else done(new UploadTypeError(kind, `${file.originalname} (${file.mimetype})`));
    },
  }).single('file');
  return new Promise((resolve, reject) =>
    parser(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return reject(new UploadTooLargeError());
        return reject(new ValidationError([{ path: err.field ?? 'file', message: err.message }], `Upload refused: ${err.message}.`));
      }
      reject(err);
    }),
  );
}

/** Read an import request: multipart with one file, or a JSON body (already parsed by express.json). */
export async function readUpload(req: Request, res: Response, kind: UploadKind): Promise<Upload> {
  if (!req.is('multipart/form-data')) return { text: null, filename: null, fields: (req.body ?? {}) as Record<string, unknown> };
  await runMulter(req, res, kind);
  const fields = { ...(req.body ?? {}) } as Record<string, unknown>;
  if (!req.file) return { text: null, filename: null, fields };
  if (req.file.buffer.includes(0)) throw new UploadTypeError(kind, `${req.file.originalname} (binary content)`);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(req.file.buffer);
  } catch {
    throw new UploadTypeError(kind, `${req.file.originalname} (not UTF-8 text)`);
  }
  return { text, filename: req.file.originalname, fields };
}
