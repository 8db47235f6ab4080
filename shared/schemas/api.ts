import { z } from 'zod';

/** One issue of a failed validation: the field path joined with dots, and a message. */
export interface ApiIssue {
  path: string;
  message: string;
}

/** The one error shape every API failure uses. */
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    issues?: ApiIssue[];
  };
}

/** Every success wraps its payload in `data`. */
export interface ApiData<T> {
  data: T;
}

/** Turns zod issues into the API's flat `{ path, message }` list. */
export function toApiIssues(error: z.ZodError): ApiIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}

/** Positive integer id taken from a URL parameter. */
export const idParam = z.object({
  id: z.coerce.number().int().positive(),
});
