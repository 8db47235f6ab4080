import { EngineInputError } from './errors';

/** The four dopants the engine models. */
export type Dopant = 'B' | 'P' | 'As' | 'Sb';

export const DOPANTS: readonly Dopant[] = Object.freeze(['B', 'P', 'As', 'Sb'] as const);

/** Name, conduction type it produces in silicon, and atomic number (IUPAC periodic table). */
export const DOPANT_INFO: Record<Dopant, { name: string; type: 'n' | 'p'; atomicNumber: number }> = {
  B: { name: 'boron', type: 'p', atomicNumber: 5 },
  P: { name: 'phosphorus', type: 'n', atomicNumber: 15 },
  As: { name: 'arsenic', type: 'n', atomicNumber: 33 },
  Sb: { name: 'antimony', type: 'n', atomicNumber: 51 },
};

/** True when `value` is one of the modelled dopant symbols. */
export function isDopant(value: unknown): value is Dopant {
  return value === 'B' || value === 'P' || value === 'As' || value === 'Sb';
}

/** Returns `value` as a Dopant or throws EngineInputError naming `path`. */
export function requireDopant(value: unknown, path = 'dopant'): Dopant {
  if (!isDopant(value)) {
    throw new EngineInputError(`unknown dopant ${JSON.stringify(value)}; expected one of ${DOPANTS.join(', ')}`, path);
  }
  return value;
}
