// Builds what a traveller prints from a stored version (document + the
// server's result), its lot and the person printing.
import type { RecipeResult } from '../../../shared/engine/types';
import { ACCEPTANCE_WINDOWS, DEFAULT_PREDEP_SOURCE } from '../../../shared/rules/acceptance-windows';
import type { RecipeDocument, RecipeStep } from '../../../shared/schemas/recipe';
import { SIGNATURE_MEANING_LABELS, type SignatureMeaning } from '../../../shared/schemas/signoff';
import type { RecipeVersion } from '../../../shared/schemas/recipes-api';
import type { TravellerInput, TravellerSetpoint, TravellerStep } from './types';

const sci = (x: number) => {
  const [m, e] = x.toExponential(2).split('e');
  return `${m}e${Number(e)}`;
};
const fixed = (x: number, digits: number) => x.toFixed(digits);
const stamp = (iso: string) => iso.slice(0, 16).replace('T', ' ') + ' UTC';

const AMBIENT_PRINT = { inert: 'N2 (inert)', 'dry-o2': 'dry O2', 'wet-o2': 'wet O2 (pyrogenic steam)' } as const;
const KIND_LABEL = { predeposition: 'Predeposition', implant: 'Implant', anneal: 'Anneal / drive-in', oxidation: 'Oxidation' } as const;

function furnaceSetpoints(s: Exclude<RecipeStep, { kind: 'implant' }>): TravellerSetpoint[] {
  const ramped = s.loadTempC < s.tempC;
  return [
    { label: 'Temperature', value: `${fixed(s.tempC, 0)} °C` },
    { label: 'Time at temperature', value: `${fixed(s.timeMin, s.timeMin < 10 ? 1 : 0)} min` },
    ...(ramped
      ? [
          { label: 'Ramp up', value: `${s.rampUpCPerMin} °C/min from ${fixed(s.loadTempC, 0)} °C` },
          { label: 'Ramp down', value: `${s.rampDownCPerMin} °C/min to ${fixed(s.loadTempC, 0)} °C` },
        ]
      : [{ label: 'Load / unload', value: `at ${fixed(s.tempC, 0)} °C (no ramp)` }]),
  ];
}

function travellerStep(step: RecipeStep, index: number, tubeName: (id: number | null) => string | undefined): TravellerStep {
  const base = { index: index + 1, kind: step.kind, label: step.label ?? KIND_LABEL[step.kind], tubeName: tubeName(step.tubeId) };
  switch (step.kind) {
    case 'predeposition': {
      const surface = step.surface.mode === 'fixed' ? `${sci(step.surface.concentration)} cm⁻³` : 'solid solubility';
      return {
        ...base,
        dopant: step.dopant,
        source: DEFAULT_PREDEP_SOURCE[step.dopant],
        ambient: 'N2 + O2 with source',
        setpoints: [...furnaceSetpoints(step), { label: 'Surface concentration', value: surface }],
      };
    }
    case 'implant':
      return {
        ...base,
        dopant: step.dopant,
        source: 'ion implant',
        setpoints: [
          { label: 'Dose', value: `${sci(step.doseCm2)} cm⁻²` },
          ...(step.energyKeV !== undefined ? [{ label: 'Energy', value: `${step.energyKeV} keV` }] : []),
          { label: 'Rp / ΔRp', value: `${step.rpUm} / ${step.dRpUm} µm` },
        ],
      };
    case 'anneal':
    case 'oxidation':
      return { ...base, ambient: AMBIENT_PRINT[step.ambient], setpoints: furnaceSetpoints(step) };
  }
}

function targets(result: RecipeResult): TravellerInput['targets'] {
  const w = ACCEPTANCE_WINDOWS;
  const out: TravellerInput['targets'] = result.final.junctionDepthsUm.map((xj, i) => ({
    label: result.final.junctionDepthsUm.length > 1 ? `Junction depth ${i + 1}` : 'Junction depth',
    predicted: fixed(xj, 3),
    window: `± ${w.junctionDepthPct} %`,
    unit: 'µm',
  }));
  if (result.final.sheetResistanceOhmSq !== null) {
    out.push({ label: 'Sheet resistance (four-point probe)', predicted: fixed(result.final.sheetResistanceOhmSq, 1), window: `± ${w.sheetResistancePct} %`, unit: 'Ω/sq' });
  }
  out.push({ label: `Surface concentration (${result.final.surfaceType}-type)`, predicted: sci(result.final.surfaceNetCm3), window: `± ${w.surfaceConcentrationPct} %`, unit: 'cm⁻³' });
  if (result.final.oxideThicknessUm > 0) {
    out.push({ label: 'Oxide thickness', predicted: fixed(result.final.oxideThicknessUm * 1000, 0), window: `± ${w.oxideThicknessPct} %`, unit: 'nm' });
  }
  return out;
}

function substrateLine(doc: RecipeDocument, result: RecipeResult | null): string {
  const s = doc.substrate;
  const bg = 'concentration' in s.background ? `${sci(s.background.concentration)} cm⁻³` : `${s.background.resistivity} Ω·cm`;
  const rho = result ? `, ${result.substrate.resistivityOhmCm.toPrecision(3)} Ω·cm` : '';
  return `${s.type}-type Si <${s.orientation}>, ${bg}${'concentration' in s.background ? rho : ''}`;
}

/** Says on paper when the prediction used tube calibration, and which factors. */
function calibrationNote(result: RecipeResult | null, tubeNames: Map<number, string>): string | null {
  if (!result?.calibration?.optedIn) return null;
  if (result.calibration.factors.length === 0) return 'Opted into tube calibration; no tube of this recipe has a fit yet';
  return result.calibration.factors.map((f) => `${tubeNames.get(f.tubeId) ?? `tube ${f.tubeId}`}: D × ${f.factor.toFixed(3)}`).join('; ');
}

export interface TravellerContext {
  version: RecipeVersion;
  lot: { lotCode: string; wafers: number; tubeName: string; openedBy: string; openedAt: string } | null;
  tubeNames: Map<number, string>;
  printedBy: string;
  now?: Date;
}

export function travellerInput(ctx: TravellerContext): TravellerInput {
  const { version: v } = ctx;
  const result = v.result;
  const m = v.releaseMeaning;
  const meaning = m && m in SIGNATURE_MEANING_LABELS ? SIGNATURE_MEANING_LABELS[m as SignatureMeaning] : (m ?? '');
  return {
    product: 'Tubewright',
    recipe: {
      name: v.recipeName,
      versionNo: v.versionNo,
      state: v.state,
      parameterSetLabel: result?.parameterSetLabel ?? v.parameterSetId ?? 'unknown',
      engineVersion: v.engineVersion ?? 'unknown',
      calibrationNote: calibrationNote(result, ctx.tubeNames),
    },
    release: v.state === 'released' && v.releasedBy && v.releasedAt ? { signedBy: v.releasedBy.name, signedAt: stamp(v.releasedAt), meaning } : null,
    lot: ctx.lot ? { lotId: ctx.lot.lotCode, wafers: ctx.lot.wafers, tubeName: ctx.lot.tubeName, openedBy: ctx.lot.openedBy, openedAt: stamp(ctx.lot.openedAt) } : null,
    substrate: substrateLine(v.document, result),
    steps: v.document.steps.map((s, i) => travellerStep(s, i, (id) => (id === null ? undefined : ctx.tubeNames.get(id)))),
    targets: result ? targets(result) : [],
    printedAt: stamp((ctx.now ?? new Date()).toISOString()),
    printedBy: ctx.printedBy,
  };
}
