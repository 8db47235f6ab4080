// What an oxidising step does to the dopant, as a documented approximation
// (Plummer, Deal & Griffin 2000 ch. 6–7 describe the physics; the bookkeeping here is ours):
//  1. Diffusion during the step uses D × the oxidation-enhancement factor (oedFactor).
//  2. The silicon consumed (δ) moves the surface down; the profile is re-referenced to
//     the new surface after the step's diffusion.
//  3. Of the dopant that was in the consumed layer, the oxide takes up the part
//     allowed by the segregation coefficient m = C_Si / C_SiO2 at the interface,
//     assuming the layer was roughly uniform: a fraction (t_ox / δ) / m, at most 1.
//     The rest is rejected into the silicon just below the new surface (pile-up).
//     Depletion of boron below the consumed layer is not modelled.
import { DOPANTS, type Dopant } from './dopants';
import { SEGREGATION } from './oxidation';

/**
 * Fraction (0..1) of the dopant in the consumed silicon that stays in the silicon.
 * @param m segregation coefficient C_Si/C_SiO2 (dimensionless)
 * @param oxideGrownUm oxide grown in the step, µm
 * @param siliconConsumedUm silicon consumed in the step, µm
 */
export function segregationKeptFraction(m: number, oxideGrownUm: number, siliconConsumedUm: number): number {
  if (!(siliconConsumedUm > 0) || !(m > 0)) return 1;
  const toOxide = oxideGrownUm / siliconConsumedUm / m;
  return Math.min(1, Math.max(0, 1 - toOxide));
}

/** Kept fraction for every dopant with the tabulated segregation coefficients. */
export function keptFractions(oxideGrownUm: number, siliconConsumedUm: number): Record<Dopant, number> {
  const out = {} as Record<Dopant, number>;
  for (const d of DOPANTS) out[d] = segregationKeptFraction(SEGREGATION[d].m, oxideGrownUm, siliconConsumedUm);
  return out;
}
