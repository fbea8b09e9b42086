/**
 * The upload edge of the measurements API: a multipart `file` (at most MEASUREMENT_MAX_FILE_BYTES,
 * a .csv/.tsv/.txt/.dat/.log name) with an `options` JSON part, or a JSON body
 * `{ fileName?, text, options? }` for pasted text. Multer's limits become 400 answers
 * naming the part at fault; a file of another type is a 415.
 */
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { MEASUREMENT_MAX_FILE_BYTES } from '../../shared/contracts/measurements';
import { badRequest, HttpError } from '../http/http-error';
import { parseOr400 } from '../http/validate';
import type { UploadedFile } from './measurement-import-service';

const ALLOWED_EXTENSIONS = /\.(csv|tsv|txt|dat|log)$/i;
const MAX_MB = MEASUREMENT_MAX_FILE_BYTES / (1024 * 1024);

const parser = multer({
  storage: multer.memoryStorage(),
  limits: {
    fileSize: MEASUREMENT_MAX_FILE_BYTES,
    files: 1,
    fields: 4,
    fieldSize: 64 * 1024,
    parts: 6,
  },
  fileFilter: (_req, file, accept) => {
    if (ALLOWED_EXTENSIONS.test(file.originalname)) return accept(null, true);
    accept(
      new HttpError(
        415,
        'UNSUPPORTED_FILE_TYPE',
        `"${file.originalname}" is not a CSV; upload a .csv, .tsv or .txt file (save spreadsheets as CSV first).`,
      ),
    );
  },
}).single('file');

const MULTER_MESSAGES: Record<string, [number, string, string]> = {
  LIMIT_FILE_SIZE: [
    400,
    'FILE_TOO_LARGE',
    `The file is larger than ${MAX_MB} MB; split the log into parts or log less often.`,
  ],
  LIMIT_FILE_COUNT: [400, 'ONE_FILE_ONLY', 'Upload one file at a time.'],
  LIMIT_UNEXPECTED_FILE: [
    400,
    'UNEXPECTED_FILE_FIELD',
    'Send the CSV in a form field named "file".',
  ],
};

/** Runs multer for multipart requests only, turning its errors into HttpErrors that say what to do. */
export const receiveCsvUpload: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) return next();
  parser(req, res, (error: unknown) => {
    if (error instanceof multer.MulterError) {
      const [status, code, message] = MULTER_MESSAGES[error.code] ?? [
        400,
        'UPLOAD_FAILED',
        `The upload could not be read (${error.message}).`,
      ];
      const fields = [{ path: error.field ?? 'file', message }];
      return next(new HttpError(status, code, message, fields));
    }
    next(error);
  });
};

const PastedCsvSchema = z.strictObject({
  fileName: z.string().trim().min(1).max(255).optional(),
  text: z.string().min(1, { error: 'Paste the CSV text.' }).max(1_000_000),
  options: z.unknown().optional(),
});

function parseOptionsField(value: unknown): unknown {
  if (value === undefined || value === '') return undefined;
  if (typeof value !== 'string') return value;
  try {
    return JSON.parse(value);
  } catch {
    throw badRequest('The options part is not valid JSON.', [
      { path: 'options', message: 'Send the options as JSON.' },
    ]);
  }
}

/** The file and raw options of an upload request (multipart or pasted JSON); 400 when there is no file. */
export function readCsvUpload(req: Request): { file: UploadedFile; options: unknown } {
  if (req.file) {
    const body = (req.body ?? {}) as Record<string, unknown>;
    return {
      file: { bytes: req.file.buffer, filename: req.file.originalname },
      options: parseOptionsField(body['options']),
    };
  }
  if (req.is('application/json')) {
    const pasted = parseOr400(PastedCsvSchema, req.body);
    return {
      file: { bytes: Buffer.from(pasted.text, 'utf8'), filename: pasted.fileName ?? 'pasted.csv' },
      options: parseOptionsField(pasted.options),
    };
  }
  throw badRequest(
    'Attach the CSV as a multipart field named "file", or send JSON {text, options}.',
    [{ path: 'file', message: 'Required.' }],
  );
}
