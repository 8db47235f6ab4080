// What a run traveller prints: plain, already formatted data. The lot route builds
// it from the database and the engine's stored result; the renderer only lays it out.

export type RecipeState = 'draft' | 'in_review' | 'released' | 'retired';
export type StepKind = 'predeposition' | 'implant' | 'anneal' | 'oxidation';
export type Dopant = 'B' | 'P' | 'As' | 'Sb';

export interface TravellerSetpoint {
  label: string;
  /** Already formatted with its unit, e.g. '950 °C', '10 °C/min', '5.0e15 cm⁻²'. */
  value: string;
}

export interface TravellerStep {
  /** 1-based position in the recipe. */
  index: number;
  kind: StepKind;
  label: string;
  dopant?: Dopant;
  /** Dopant source as the fab names it, e.g. 'POCl3', 'BBr3', 'BN solid source', 'PH3', 'B2H6', 'AsH3', 'ion implant'. */
  source?: string;
  tubeName?: string;
  /** Temperatures, times, ramps, doses, flows — in print order. */
  setpoints: TravellerSetpoint[];
  /** e.g. 'N2', 'O2', 'wet O2 (pyrogenic)', 'N2 + 3 % O2'. */
  ambient?: string;
}

export interface TravellerTarget {
  label: string;
  /** The predicted number, formatted without its unit, e.g. '0.82'. */
  predicted: string;
  /** Acceptance window, e.g. '± 10 %' or '0.75 – 0.90'. */
  window: string;
  unit: string;
}

export interface TravellerInput {
  product: 'Tubewright';
  recipe: {
    name: string;
    code?: string;
    versionNo: number;
    state: RecipeState;
    parameterSetLabel: string;
    engineVersion: string;
    calibrationNote?: string | null;
  };
  /** The lead's signature; null while the version is not released. */
  release: { signedBy: string; signedAt: string; meaning: string } | null;
  /** null prints a traveller without a lot (e.g. a preview of a draft). */
  lot: { lotId: string; wafers: number; tubeName: string; openedBy: string; openedAt: string } | null;
  /** e.g. 'n-type Si <100>, 5 ohm·cm (8.9e14 cm⁻³ P)'. */
  substrate: string;
  steps: TravellerStep[];
  targets: TravellerTarget[];
  printedAt: string;
  printedBy: string;
}

export interface SafetyItem {
  /** Stable key, e.g. 'phosphine', 'hf', 'hot-furnace'. */
  id: string;
  title: string;
  text: string;
  /** Step indices that call for this caution (empty when it applies to the run as a whole). */
  steps: number[];
}
