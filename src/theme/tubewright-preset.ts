import { definePreset } from '@primeuix/themes';
import Aura from '@primeuix/themes/aura';

/*
 * Tubewright's own look over PrimeVue's Aura base: one accent (a deep
 * "quartz-tube" teal, mixed for this product) and a cool grey surface.
 * Light is the default; dark applies while <html> carries DARK_MODE_CLASS.
 */
export const DARK_MODE_CLASS = 'tw-dark';

const quartzTeal = {
  50: '#eef8f9',
  100: '#d3eef1',
  200: '#a9dce2',
  300: '#73c2cc',
  400: '#3ea2b0',
  500: '#1f8594',
  600: '#156b7a',
  700: '#135764',
  800: '#144853',
  900: '#143c45',
  950: '#08252c',
};

const coolGrey = {
  0: '#ffffff',
  50: '#f6f8f9',
  100: '#eceff2',
  200: '#dce1e6',
  300: '#c3cad2',
  400: '#96a0ab',
  500: '#6b7682',
  600: '#525c67',
  700: '#3e4750',
  800: '#2a3138',
  900: '#1b2026',
  950: '#0f1317',
};

export const TubewrightPreset = definePreset(Aura, {
  semantic: {
    primary: quartzTeal,
    colorScheme: {
      light: {
        surface: coolGrey,
        primary: {
          color: '{primary.600}',
          contrastColor: '#ffffff',
          hoverColor: '{primary.700}',
          activeColor: '{primary.800}',
        },
        highlight: {
          background: '{primary.50}',
          focusBackground: '{primary.100}',
          color: '{primary.800}',
          focusColor: '{primary.900}',
        },
      },
      dark: {
        surface: coolGrey,
        primary: {
          color: '{primary.300}',
          contrastColor: '{surface.950}',
          hoverColor: '{primary.200}',
          activeColor: '{primary.100}',
        },
      },
    },
  },
});
