// Leaving the workspace (another route, another version, closing the tab)
// with unsaved changes asks first. `pass()` lets one navigation through
// (e.g. into a new version that carries the edits along).
import { onBeforeUnmount, onMounted } from 'vue';
import { onBeforeRouteLeave, onBeforeRouteUpdate } from 'vue-router';
import { useConfirm } from 'primevue/useconfirm';

export function useLeaveGuard(dirty: () => boolean) {
  const confirm = useConfirm();
  let passOnce = false;

  const ask = () =>
    new Promise<boolean>((resolve) => {
      confirm.require({
        header: 'Leave without saving?',
        message: 'This draft has changes that are not saved. Leaving drops them.',
        icon: 'pi pi-exclamation-triangle',
        rejectProps: { label: 'Stay', severity: 'secondary', outlined: true },
        acceptProps: { label: 'Leave', severity: 'danger' },
        accept: () => resolve(true),
        reject: () => resolve(false),
        onHide: () => resolve(false),
      });
    });

  async function guard(): Promise<boolean> {
    if (passOnce) {
      passOnce = false;
      return true;
    }
    return dirty() ? ask() : true;
  }

  function onUnload(event: BeforeUnloadEvent) {
    if (dirty()) event.preventDefault();
  }

  onBeforeRouteLeave(guard);
  onBeforeRouteUpdate((to, from) => (to.path === from.path && to.query.version === from.query.version ? true : guard()));
  onMounted(() => window.addEventListener('beforeunload', onUnload));
  onBeforeUnmount(() => window.removeEventListener('beforeunload', onUnload));

  return {
    pass: () => {
      passOnce = true;
    },
  };
}
