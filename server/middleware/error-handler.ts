import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiErrorBody } from '../../shared/schemas/api';
import { HttpError } from '../http-error';

/** Maps MariaDB driver codes (Drizzle wraps them in `cause`) to API errors. */
function fromDatabase(err: unknown): HttpError | undefined {
  const code = (err as { cause?: { code?: string }; code?: string })?.cause?.code ?? (err as { code?: string })?.code;
  switch (code) {
    case 'ER_DUP_ENTRY':
      return new HttpError(409, 'conflict', 'A record with the same unique value already exists');
    case 'ER_NO_REFERENCED_ROW_2':
      return new HttpError(422, 'unknown_reference', 'The request refers to a record that does not exist');
    case 'ER_ROW_IS_REFERENCED_2':
      return new HttpError(409, 'in_use', 'The record is still referred to by other records');
    case 'ER_CHECK_CONSTRAINT_VIOLATED':
      return new HttpError(422, 'constraint', 'The values break a rule of the data');
    default:
      return undefined;
  }
}

/** Body-parser errors carry `type` and `status`; multer's carry `code`. */
function fromBodyParser(err: unknown): HttpError | undefined {
  const e = err as { type?: string; status?: number; name?: string; code?: string; field?: string };
  if (e?.name === 'MulterError') {
    if (e.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'too_large', 'The file is too large', [{ path: 'file', message: 'The file is larger than 2 MB' }]);
    return new HttpError(400, 'invalid_upload', 'Send one CSV file in the field "file"', [{ path: e.field ?? 'file', message: 'Send one CSV file in the field "file"' }]);
  }
  if (e?.type === 'entity.parse.failed') return new HttpError(400, 'malformed_json', 'The request body is not valid JSON');
  if (e?.type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large');
  if (e?.status && e.status >= 400 && e.status < 500) return new HttpError(e.status, 'bad_request', 'The request is not valid');
  return undefined;
}

export function errorHandler(opts: { exposeStack: boolean; log?: (err: unknown) => void }): ErrorRequestHandler {
  return (err, _req, res, _next) => {
    const known = err instanceof HttpError ? err : (fromDatabase(err) ?? fromBodyParser(err));
    if (!known) (opts.log ?? console.error)(err);
    const status = known?.status ?? 500;
    const body: ApiErrorBody & { error: { stack?: string } } = {
      error: {
        code: known?.code ?? 'internal',
        message: known?.message ?? 'Something went wrong on the server',
        ...(known?.issues ? { issues: known.issues } : {}),
        ...(!known && opts.exposeStack && err instanceof Error ? { stack: err.stack } : {}),
      },
    };
    res.status(status).json(body);
  };
}

/** Unknown /api routes answer JSON, not the SPA's HTML. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.path}` } });
};
