import { describe, expect, it } from 'vitest';
import { effectScope, nextTick, ref } from 'vue';
import { typicalImplant } from '../../../shared/engine';
import { implantSuggestion, roundTable, useImplantPrefill } from '../../../src/composables/use-implant-prefill';
import type { EditableStep } from '../../../src/composables/use-step-fields';

const implant = (extra: Partial<EditableStep> = {}): EditableStep => ({ id: 'i', kind: 'implant', tubeId: null, dopant: 'B', doseCm2: 1e15, energyKeV: 40, rpUm: 0.13, dRpUm: 0.045, ...extra });

describe('implantSuggestion', () => {
  it('reads the energy as typed, with its unit, and asks the cited range table', () => {
    expect(implantSuggestion(implant({ energyKeV: '0.04 MeV' }))).toEqual({ ...typicalImplant('B', 40)!, dopant: 'B', energyKeV: 40 });
  });

  it.each([[{ energyKeV: 5000 }], [{ energyKeV: '' }], [{ dopant: 'Ge' }]])('has nothing to say for %j', (extra) => {
    expect(implantSuggestion(implant(extra))).toBeNull();
  });
});

describe('useImplantPrefill', () => {
  it('refills Rp and ΔRp on a new energy while they still hold the table values', async () => {
    const t40 = typicalImplant('B', 40)!;
    const step = ref(implant({ rpUm: roundTable(t40.rpUm), dRpUm: roundTable(t40.dRpUm) }));
    const scope = effectScope();
    scope.run(() => useImplantPrefill(step, () => true));
    step.value.energyKeV = 80;
    await nextTick();
    const t80 = typicalImplant('B', 80)!;
    expect(step.value.rpUm).toBe(roundTable(t80.rpUm));
    expect(step.value.dRpUm).toBe(roundTable(t80.dRpUm));
    scope.stop();
  });

  it('never overwrites values the engineer typed', async () => {
    const step = ref(implant({ rpUm: 0.2, dRpUm: 0.05 }));
    const scope = effectScope();
    const { apply } = scope.run(() => useImplantPrefill(step, () => true))!;
    step.value.energyKeV = 80;
    await nextTick();
    expect(step.value.rpUm).toBe(0.2);
    apply(); // the "Use these" button
    expect(step.value.rpUm).toBe(roundTable(typicalImplant('B', 80)!.rpUm));
    scope.stop();
  });
});
