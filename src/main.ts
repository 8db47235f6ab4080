import { createApp } from 'vue';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import ToastService from 'primevue/toastservice';
import ConfirmationService from 'primevue/confirmationservice';
import Tooltip from 'primevue/tooltip';
import 'primeicons/primeicons.css';
import '@fontsource/ibm-plex-mono/400.css';
import '@fontsource/ibm-plex-mono/500.css';
import '@fontsource/ibm-plex-mono/600.css';
import './styles/base.css';
import App from './App.vue';
import { router, followSessionEnd } from './router';
import { useAuthStore } from './stores/auth';
import { DARK_MODE_CLASS, TubewrightPreset } from './theme/tubewright-preset';
import { applyStoredThemeMode } from './composables/use-theme-mode';

applyStoredThemeMode();

const app = createApp(App);
const pinia = createPinia();
app.use(pinia);
app.use(PrimeVue, {
  ripple: false,
  theme: {
    preset: TubewrightPreset,
    options: { darkModeSelector: `.${DARK_MODE_CLASS}`, cssLayer: false },
  },
});
app.use(ToastService);
app.use(ConfirmationService);
app.directive('tooltip', Tooltip);

// Know who is signed in before the first navigation, so `/` can resolve to the role's home.
useAuthStore(pinia)
  .ensureLoaded()
  .catch(() => undefined)
  .finally(async () => {
    app.use(router);
    followSessionEnd();
    await router.isReady();
    app.mount('#app');
  });
