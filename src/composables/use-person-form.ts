import { reactive, ref } from 'vue';
import { createUserSchema, patchUserSchema, type Role, type User } from '../../shared/schemas/users';
import { useUsersStore } from '../stores/users';
import { useFormErrors } from './use-form-errors';
import { useApiError } from './use-api-error';

const PERSON_FIELDS = ['email', 'name', 'role', 'password'] as const;

/** State and saving for the person dialog: create (all fields) or edit (name and role). */
export function usePersonForm() {
  const store = useUsersStore();
  const { report } = useApiError();
  const { errors, formError, validate, clear } = useFormErrors();
  const form = reactive({ email: '', name: '', role: null as Role | null, password: '' });
  const editing = ref<User | null>(null);
  const saving = ref(false);

  function reset(person: User | null): void {
    editing.value = person;
    Object.assign(form, { email: person?.email ?? '', name: person?.name ?? '', role: person?.role ?? null, password: '' });
    clear();
  }

  async function save(): Promise<User | null> {
    const person = editing.value;
    saving.value = true;
    try {
      if (!person) {
        const input = validate(createUserSchema, form);
        return input ? await store.create(input) : null;
      }
      const changes: Record<string, unknown> = {};
      if (form.name !== person.name) changes.name = form.name;
      if (form.role !== person.role) changes.role = form.role;
      if (Object.keys(changes).length === 0) return person; // nothing changed
      const patch = validate(patchUserSchema, changes);
      return patch ? await store.update(person.id, patch) : null;
    } catch (error) {
      report(error, {
        fields: errors,
        knownFields: PERSON_FIELDS,
        summary: person ? 'Person not saved' : 'Person not added',
      });
      return null;
    } finally {
      saving.value = false;
    }
  }

  return { form, editing, errors, formError, saving, reset, save };
}
