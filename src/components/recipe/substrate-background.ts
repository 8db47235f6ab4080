// Switching how the substrate background is given (concentration ⇄
// resistivity) keeps the same wafer: the value is converted with the
// engine's resistivity model (ASTM F723) instead of being thrown away.
import { dopingFromResistivity, resistivityFromDoping } from '../../../shared/engine';
import { parseQuantity, QUANTITY_KINDS } from '../../../shared/schemas/quantity';

export type BackgroundMode = 'concentration' | 'resistivity';
export type EditableBackground = { concentration?: unknown; resistivity?: unknown };

export const backgroundMode = (b: EditableBackground): BackgroundMode => ('resistivity' in b && b.resistivity !== undefined ? 'resistivity' : 'concentration');

const round3 = (x: number) => Number(x.toPrecision(3));

/** The background given the other way, converted when the current value reads; a typical value otherwise. */
export function switchBackground(b: EditableBackground, type: 'n' | 'p', to: BackgroundMode): EditableBackground {
  if (backgroundMode(b) === to) return b;
  try {
    if (to === 'resistivity') {
      const n = parseQuantity(b.concentration, QUANTITY_KINDS.concentration, 'Background');
      return { resistivity: n.ok ? round3(resistivityFromDoping(n.value, type)) : 10 };
    }
    const rho = parseQuantity(b.resistivity, QUANTITY_KINDS.resistivity, 'Resistivity');
    return { concentration: rho.ok ? round3(dopingFromResistivity(rho.value, type)) : 1e15 };
  } catch {
    return to === 'resistivity' ? { resistivity: 10 } : { concentration: 1e15 };
  }
}
