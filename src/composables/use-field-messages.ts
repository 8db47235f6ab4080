// The workspace provides, and every field of the recipe forms reads, the
// messages for a document path: errors (schema, engine, server) and tube
// cautions (rule breaches that will block submission). Provide/inject keeps
// the step cards free of message props.
import { inject, provide, type ComputedRef, type InjectionKey } from 'vue';
import { messagesUnder } from '../components/recipe/recipe-draft-rules';

export interface FieldMessages {
  errors: ComputedRef<Record<string, string>>;
  cautions: ComputedRef<Record<string, string>>;
  /** True when the form is read only (non-draft version, role, not the author). */
  disabled: ComputedRef<boolean>;
}

const KEY: InjectionKey<FieldMessages> = Symbol('field-messages');

export function provideFieldMessages(messages: FieldMessages): void {
  provide(KEY, messages);
}

export function useFieldMessages() {
  const messages = inject(KEY, null);
  if (!messages) throw new Error('useFieldMessages needs provideFieldMessages in a parent (the Recipe workspace)');
  return {
    disabled: messages.disabled,
    errorAt: (path: string) => messages.errors.value[path],
    cautionAt: (path: string) => messages.cautions.value[path],
    /** Errors for a whole subtree that no single field shows, e.g. 'steps.2'. */
    errorsUnder: (path: string) => messagesUnder(messages.errors.value, path),
    cautionsUnder: (path: string) => messagesUnder(messages.cautions.value, path),
  };
}
