import { ref } from 'vue';
import type { z } from 'zod';
import { toApiIssues } from '../../shared/schemas/api';
import { issuesToFieldErrors, type FieldErrors } from './use-api-error';

/**
 * Plain wording for the checks the shared schemas leave to zod's defaults
 * (an empty number field, an unchosen option). Messages written in the
 * schemas take precedence over these.
 */
const plainMessages: z.core.$ZodErrorMap = (issue) => {
  if (issue.code === 'invalid_type') {
    if (issue.input === undefined || issue.input === null || issue.input === '') {
      return issue.expected === 'number' ? 'Enter a number' : 'Required';
    }
    if (issue.expected === 'number') return 'Enter a number';
  }
  if (issue.code === 'invalid_value') return 'Choose one of the options';
  if (issue.code === 'unrecognized_keys') return 'Unexpected field';
  return undefined;
};

/**
 * Field messages for one form, filled by the same zod schema the server
 * parses (client-side check before sending) or by the server's issues.
 */
export function useFormErrors() {
  const errors = ref<FieldErrors>({});
  /** Messages that belong to no single field (e.g. "Change at least one field"). */
  const formError = ref('');

  /** Parses `values`; on failure fills the field messages and returns null. */
  function validate<S extends z.ZodType>(schema: S, values: unknown): z.output<S> | null {
    const result = schema.safeParse(values, { error: plainMessages });
    if (result.success) {
      clear();
      return result.data;
    }
    const { fields, rest } = issuesToFieldErrors(toApiIssues(result.error));
    errors.value = fields;
    formError.value = rest.map((issue) => issue.message).join(' ');
    return null;
  }

  function clear(): void {
    errors.value = {};
    formError.value = '';
  }

  return { errors, formError, validate, clear };
}
