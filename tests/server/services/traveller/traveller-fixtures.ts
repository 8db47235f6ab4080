// Demo travellers for tests and the benchmark. All names, people and numbers here are
// invented demo data, not measurements or recommended settings.
import type { TravellerInput, TravellerStep } from '../../../../server/services/traveller/types';

export const emitterSteps: TravellerStep[] = [
  {
    index: 1,
    kind: 'predeposition',
    label: 'Phosphorus emitter predeposition',
    dopant: 'P',
    source: 'POCl3',
    tubeName: 'Tube B2',
    setpoints: [
      { label: 'Temperature', value: '950 °C' },
      { label: 'Time at temperature', value: '20 min' },
      { label: 'Ramp up', value: '8 °C/min from 750 °C' },
      { label: 'Ramp down', value: '4 °C/min to 750 °C' },
      { label: 'Source limit', value: 'solid solubility' },
    ],
    ambient: 'N2 + 5 % O2',
  },
  {
    index: 2,
    kind: 'anneal',
    label: 'Drive-in',
    dopant: 'P',
    tubeName: 'Tube B3',
    setpoints: [
      { label: 'Temperature', value: '1050 °C' },
      { label: 'Time at temperature', value: '45 min' },
      { label: 'Ramp up', value: '10 °C/min' },
      { label: 'Ramp down', value: '3 °C/min' },
    ],
    ambient: 'N2',
  },
  {
    index: 3,
    kind: 'oxidation',
    label: 'Field oxide, wet',
    tubeName: 'Tube A1',
    setpoints: [
      { label: 'Temperature', value: '1000 °C' },
      { label: 'Time at temperature', value: '60 min' },
      { label: 'H2 : O2 flow', value: '1.8 : 1' },
    ],
    ambient: 'wet O2 (pyrogenic)',
  },
];

export const gasSteps: TravellerStep[] = [
  {
    index: 1,
    kind: 'predeposition',
    label: 'Boron predeposition from diborane',
    dopant: 'B',
    source: 'B2H6',
    setpoints: [{ label: 'Temperature', value: '1000 °C' }, { label: 'Time', value: '15 min' }],
    ambient: 'N2 + O2',
  },
  {
    index: 2,
    kind: 'predeposition',
    label: 'Phosphine predeposition',
    dopant: 'P',
    source: 'PH3',
    setpoints: [{ label: 'Temperature', value: '950 °C' }, { label: 'Time', value: '25 min' }],
    ambient: 'N2 + O2',
  },
  {
    index: 3,
    kind: 'predeposition',
    label: 'Arsenic predeposition',
    dopant: 'As',
    source: 'AsH3',
    setpoints: [{ label: 'Temperature', value: '1000 °C' }, { label: 'Time', value: '30 min' }],
    ambient: 'N2 + O2',
  },
  {
    index: 4,
    kind: 'implant',
    label: 'Boron channel-stop implant',
    dopant: 'B',
    source: 'ion implant',
    setpoints: [
      { label: 'Dose', value: '2.0e13 cm⁻²' },
      { label: 'Energy', value: '40 keV' },
      { label: 'Tilt', value: '7°' },
    ],
  },
  {
    index: 5,
    kind: 'predeposition',
    label: 'Boron predeposition from BBr3',
    dopant: 'B',
    source: 'BBr3',
    setpoints: [{ label: 'Temperature', value: '1025 °C' }, { label: 'Time', value: '10 min' }],
    ambient: 'N2 + O2',
  },
];

export function demoTraveller(overrides: Partial<TravellerInput> = {}): TravellerInput {
  return {
    product: 'Tubewright',
    recipe: {
      name: 'NPN emitter, 0.8 µm',
      code: 'EMT-08',
      versionNo: 3,
      state: 'released',
      parameterSetLabel: 'Handbook Arrhenius set 2024-1',
      engineVersion: 'engine 0.4.2',
      calibrationNote: 'Tube B3 correction fitted on 4 lots',
    },
    release: { signedBy: 'R. Okafor (lead)', signedAt: '2025-03-14 09:42', meaning: 'Approved for pilot-line runs' },
    lot: { lotId: 'L25-0412', wafers: 25, tubeName: 'Tube B3', openedBy: 'J. Marsh', openedAt: '2025-03-17 07:55' },
    substrate: 'p-type Si <100>, 10 Ω·cm (1.3e15 cm⁻³ B)',
    steps: emitterSteps,
    targets: [
      { label: 'Junction depth after step 2', predicted: '0.812', window: '± 10 %', unit: 'µm' },
      { label: 'Sheet resistance after step 2', predicted: '18.6', window: '± 8 %', unit: 'Ω/sq' },
      { label: 'Surface concentration', predicted: '3.41e20', window: '± 25 %', unit: 'cm⁻³' },
      { label: 'Oxide thickness after step 3', predicted: '412', window: '± 5 %', unit: 'nm' },
    ],
    printedAt: '2025-03-17 08:02',
    printedBy: 'J. Marsh (operator)',
    ...overrides,
  };
}

/** A draft of the same recipe: not released, not signed. */
export function demoDraft(): TravellerInput {
  const released = demoTraveller();
  return demoTraveller({ recipe: { ...released.recipe, versionNo: 4, state: 'draft' }, release: null });
}

/** A long recipe (`count` steps, cycling through the demo steps) for page-break checks. */
export function demoLongTraveller(count = 30): TravellerInput {
  const pool = [...emitterSteps, ...gasSteps];
  const steps = Array.from({ length: count }, (_, i) => ({ ...pool[i % pool.length], index: i + 1, label: `${pool[i % pool.length].label} (${i + 1})` }));
  return demoTraveller({ steps });
}
