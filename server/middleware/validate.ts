import type { Request } from 'express';
import type { z } from 'zod';
import { toApiIssues } from '../../shared/schemas/api';
import { HttpError } from '../http-error';

function parseWith<S extends z.ZodType>(schema: S, value: unknown, where: string): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    throw new HttpError(400, 'invalid_input', `The request ${where} is not valid`, toApiIssues(parsed.error));
  }
  return parsed.data;
}

/** Parses the JSON body with a shared zod schema (a missing body counts as {}). */
export const parseBody = <S extends z.ZodType>(schema: S, req: Request) => parseWith(schema, req.body ?? {}, 'body');
export const parseQuery = <S extends z.ZodType>(schema: S, req: Request) => parseWith(schema, req.query, 'query');
export const parseParams = <S extends z.ZodType>(schema: S, req: Request) => parseWith(schema, req.params, 'path');
