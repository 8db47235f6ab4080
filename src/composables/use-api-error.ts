import type { Ref } from 'vue';
import { useToast } from 'primevue/usetoast';
import type { ApiIssue } from '../../shared/schemas/api';
import { ApiError } from '../api/client';

/** Field messages of a form, keyed by the field's path ("name", "ambients.0" is folded into "ambients"). */
export type FieldErrors = Record<string, string>;

/**
 * Maps `{ path, message }` issues onto form fields. A nested path is shown
 * under its top-level field; the first message per field wins; issues whose
 * field is not in the form are returned as `rest` so they are not lost.
 */
export function issuesToFieldErrors(issues: ApiIssue[], knownFields?: readonly string[]): { fields: FieldErrors; rest: ApiIssue[] } {
  const fields: FieldErrors = {};
  const rest: ApiIssue[] = [];
  for (const issue of issues) {
    const field = issue.path.split('.')[0] ?? '';
    if (field === '' || (knownFields && !knownFields.includes(field))) {
      rest.push(issue);
    } else if (!(field in fields)) {
      fields[field] = issue.message;
    }
  }
  return { fields, rest };
}

/** A readable message for anything thrown by an API call. */
export function describeError(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}

function summaryFor(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Error';
  if (error.status === 0) return 'Server unreachable';
  if (error.status === 403) return 'Not allowed';
  if (error.status === 409) return 'Conflict';
  if (error.status === 429) return 'Too many attempts';
  if (error.status >= 500) return 'Server error';
  return 'Not saved';
}

interface ReportOptions {
  /** When given, validation issues go under the form's fields instead of a toast. */
  fields?: Ref<FieldErrors>;
  knownFields?: readonly string[];
  summary?: string;
}

/**
 * One helper for every failed call: validation issues become field messages
 * of the form when one is given, everything else (and issues without a field)
 * becomes a toast. A 401 is already handled by the auth store (sign-in page).
 */
export function useApiError() {
  const toast = useToast();

  function report(error: unknown, options: ReportOptions = {}): void {
    if (error instanceof ApiError && error.status === 401 && error.code !== 'invalid_credentials') return;

    if (error instanceof ApiError && error.issues.length > 0 && options.fields) {
      const { fields, rest } = issuesToFieldErrors(error.issues, options.knownFields);
      options.fields.value = fields;
      if (rest.length === 0) return;
      toast.add({ severity: 'error', summary: options.summary ?? summaryFor(error), detail: rest.map((i) => i.message).join(' '), life: 6000 });
      return;
    }

    toast.add({ severity: 'error', summary: options.summary ?? summaryFor(error), detail: describeError(error), life: 6000 });
  }

  return { report };
}
