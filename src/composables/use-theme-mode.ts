import { ref, watch } from 'vue';
import { DARK_MODE_CLASS } from '../theme/tubewright-preset';

const STORAGE_KEY = 'tubewright.theme';

function readStored(): boolean {
  try {
    return localStorage.getItem(STORAGE_KEY) === 'dark';
  } catch {
    return false; // storage blocked: stay light
  }
}

function apply(dark: boolean): void {
  document.documentElement.classList.toggle(DARK_MODE_CLASS, dark);
}

// Module-level so every caller shares one state.
const dark = ref(false);
let started = false;

/** Call once before mounting, so the stored mode applies without a flash of light. */
export function applyStoredThemeMode(): void {
  if (started) return;
  started = true;
  dark.value = readStored();
  apply(dark.value);
  watch(dark, (value) => {
    apply(value);
    try {
      localStorage.setItem(STORAGE_KEY, value ? 'dark' : 'light');
    } catch {
      /* storage blocked: the choice lasts for this page only */
    }
  });
}

/** Light by default; dark when chosen, remembered in localStorage. */
export function useThemeMode() {
  applyStoredThemeMode();
  const toggle = () => {
    dark.value = !dark.value;
  };
  return { dark, toggle };
}
