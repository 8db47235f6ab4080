// Typical Rp and ΔRp for an implant step from the engine's cited range table.
// When the energy or dopant changes and the step still holds the previous
// table values (the engineer has not typed their own), the new ones are
// filled in; typed values are never overwritten.
import { computed, watch, type Ref } from 'vue';
import { typicalImplant, isDopant } from '../../shared/engine';
import { parseQuantity, QUANTITY_KINDS } from '../../shared/schemas/quantity';
import type { EditableStep } from './use-step-fields';

export type ImplantSuggestion = { rpUm: number; dRpUm: number; dopant: string; energyKeV: number } | null;

function readEnergy(value: unknown): number | null {
  const parsed = parseQuantity(value, QUANTITY_KINDS.energy, 'Energy');
  return parsed.ok && parsed.value > 0 ? parsed.value : null;
}

/** The table's Rp/ΔRp (µm) for a step's dopant and energy, or null outside the table. */
export function implantSuggestion(step: Record<string, unknown>): ImplantSuggestion {
  const energy = readEnergy(step.energyKeV);
  if (!isDopant(step.dopant) || energy === null) return null;
  const typical = typicalImplant(step.dopant, energy);
  return typical ? { ...typical, dopant: step.dopant, energyKeV: energy } : null;
}

const close = (a: unknown, b: number) => typeof a === 'number' && Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));
/** Table values are shown and stored rounded to 4 significant digits. */
export const roundTable = (x: number) => Number(x.toPrecision(4));

export function useImplantPrefill(step: Ref<EditableStep>, enabled: () => boolean) {
  const suggestion = computed(() => implantSuggestion(step.value));

  function apply(): void {
    const s = suggestion.value;
    if (!s) return;
    step.value.rpUm = roundTable(s.rpUm);
    step.value.dRpUm = roundTable(s.dRpUm);
  }

  watch(suggestion, (next, previous) => {
    if (!next || !previous || !enabled()) return;
    const untouched = close(step.value.rpUm, roundTable(previous.rpUm)) && close(step.value.dRpUm, roundTable(previous.dRpUm));
    if (untouched) apply();
  });

  return { suggestion, apply };
}
