// Loads the mathjs unit reader in the background (its own chunk), so typed
// units such as "950 degC" work without mathjs in the workspace's first load.
import { ref, type Ref } from 'vue';

let loading: Promise<void> | null = null;
const ready = ref(false);

/** Starts loading the unit reader once; resolves when strings with units can be read. */
export function loadUnitReader(): Promise<void> {
  loading ??= import('../../shared/schemas/unit-reader').then(() => {
    ready.value = true;
  });
  return loading;
}

/** A flag that turns true when the reader is in; computed values that read it re-run then. */
export function useUnitReader(): Ref<boolean> {
  void loadUnitReader();
  return ready;
}
