import { AMBIENTS, AMBIENT_LABELS, TUBE_DEDICATIONS, type TubeDedication } from '../../../shared/schemas/tubes';

export const DEDICATION_LABELS: Record<TubeDedication, string> = {
  'p-type': 'p-type',
  'n-type': 'n-type',
  undoped: 'Undoped',
};

/** What each dedication admits; a tube is never mixed between families (common practice). */
export const DEDICATION_HINTS: Record<TubeDedication, string> = {
  'p-type': 'acceptor sources and drive-ins only (boron family)',
  'n-type': 'donor sources and drive-ins only (phosphorus, arsenic, antimony)',
  undoped: 'oxidation and anneals with no dopant source',
};

export const DEDICATION_OPTIONS = TUBE_DEDICATIONS.map((value) => ({ value, label: DEDICATION_LABELS[value] }));

export const AMBIENT_OPTIONS = AMBIENTS.map((value) => ({ value, label: AMBIENT_LABELS[value] }));
