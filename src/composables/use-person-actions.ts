import { useConfirm } from 'primevue/useconfirm';
import { useToast } from 'primevue/usetoast';
import type { Role, User } from '../../shared/schemas/users';
import { ROLE_LABELS } from '../components/person/person-roles';
import { useUsersStore } from '../stores/users';
import { useApiError } from './use-api-error';

/** The People screen's one-click changes: role and active flag (optimistic, rolled back on refusal). */
export function usePersonActions() {
  const store = useUsersStore();
  const confirm = useConfirm();
  const toast = useToast();
  const { report } = useApiError();

  async function changeRole(person: User, role: Role): Promise<void> {
    try {
      await store.update(person.id, { role });
      toast.add({ severity: 'success', summary: 'Role changed', detail: `${person.name} is now ${ROLE_LABELS[role]}.`, life: 3000 });
    } catch (error) {
      report(error, { summary: 'Role not changed' });
    }
  }

  async function setActive(person: User, active: boolean): Promise<void> {
    try {
      await store.update(person.id, { active });
      const detail = active ? `${person.name} can sign in again.` : `${person.name} is signed out everywhere.`;
      toast.add({ severity: 'success', summary: active ? 'Reactivated' : 'Deactivated', detail, life: 4000 });
    } catch (error) {
      report(error, { summary: active ? 'Not reactivated' : 'Not deactivated' });
    }
  }

  /** Asks first: deactivating ends the person's sessions at once. */
  function toggleActive(person: User): void {
    if (!person.active) {
      void setActive(person, true);
      return;
    }
    confirm.require({
      header: `Deactivate ${person.name}?`,
      message:
        `${person.name} will be signed out at once on every device, and can no longer sign in. ` +
        'Their recipes, sign-offs and audit entries stay. You can reactivate them later.',
      icon: 'pi pi-exclamation-triangle',
      rejectProps: { label: 'Cancel', severity: 'secondary', text: true },
      acceptProps: { label: 'Deactivate', severity: 'danger', 'data-testid': 'confirm-deactivate' },
      accept: () => setActive(person, false),
    });
  }

  return { changeRole, toggleActive };
}
