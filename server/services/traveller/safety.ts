// The cautions a run traveller prints, chosen from what the steps actually use.
// General trade language only: no exposure limits or other figures, because those
// belong to the supplier's SDS and the site's procedures, which the deferral names.
import type { SafetyItem, TravellerStep } from './types';

/** Always printed as the last line of the safety block. */
export const SAFETY_DEFERRAL =
  "These cautions do not replace the site's EHS procedures, the gas or chemical supplier's Safety Data Sheet (SDS), " +
  'local codes, or licensed practice; follow them.';

interface Rule {
  id: string;
  title: string;
  text: string;
  applies: (step: TravellerStep) => boolean;
}

const sourceOf = (s: TravellerStep) => s.source ?? '';
const ambientOf = (s: TravellerStep) => s.ambient ?? '';
const isFurnaceStep = (s: TravellerStep) => s.kind !== 'implant';

const GAS_CABINET =
  'Use it only from a ventilated gas cabinet with continuous toxic-gas detection, leak-checked and purged lines, ' +
  "and never break a connection alone or outside the site's gas-handling and breathing-protection practice. " +
  'On a gas alarm, stop, leave the area and follow the emergency procedure.';

// Order is print order: the most acute hazards first.
const RULES: Rule[] = [
  {
    id: 'arsine',
    title: 'Arsine (AsH3)',
    text:
      'Extremely toxic, flammable gas; harm from exposure may show only hours later. ' +
      GAS_CABINET +
      ' Treat exhaust lines, pump oil and tube deposits as arsenic-contaminated.',
    applies: (s) => /\bAsH3\b|arsine/i.test(sourceOf(s)),
  },
  {
    id: 'phosphine',
    title: 'Phosphine (PH3)',
    text: 'Highly toxic, flammable gas that can ignite on its own in air. ' + GAS_CABINET,
    applies: (s) => /\bPH3\b|phosphine/i.test(sourceOf(s)),
  },
  {
    id: 'diborane',
    title: 'Diborane (B2H6)',
    text:
      'Highly toxic gas that can ignite on its own in air and is flammable over a wide range of mixtures; ' +
      'it irritates the lungs. ' +
      GAS_CABINET,
    applies: (s) => /\bB2H6\b|diborane/i.test(sourceOf(s)),
  },
  {
    id: 'pocl3',
    title: 'Phosphorus oxychloride (POCl3) liquid source',
    text:
      'Corrosive, toxic liquid that reacts with water and moist air, giving hydrogen chloride (HCl) and phosphoric acid fumes. ' +
      'Change or refill the bubbler only when cool and closed, under exhaust, with acid-resistant gloves, apron and face shield; ' +
      'keep water away from the source and its lines.',
    applies: (s) => /POCl3|oxychloride/i.test(sourceOf(s)),
  },
  {
    id: 'bbr3',
    title: 'Boron tribromide (BBr3) liquid source',
    text:
      'Corrosive, toxic liquid that reacts violently with water and moist air, giving hydrogen bromide (HBr) fumes. ' +
      'Change or refill the bubbler only when cool and closed, under exhaust, with acid-resistant gloves, apron and face shield; ' +
      'keep water away from the source and its lines.',
    applies: (s) => /BBr3|tribromide/i.test(sourceOf(s)),
  },
  {
    id: 'hf',
    title: 'Hydrofluoric acid (HF) — deglaze and oxide strip',
    text:
      'A predeposition leaves a doped glass that is usually stripped in dilute HF. HF passes through skin: burns can be ' +
      'painless at first and appear hours later, and absorption can cause severe systemic poisoning. Work only at the wet bench ' +
      'with HF-rated gloves, apron and face shield; keep calcium gluconate gel at hand as the site procedure prescribes, and get ' +
      'medical help after any contact, even if it does not hurt.',
    applies: (s) => s.kind === 'predeposition' || /\bHF\b|hydrofluoric/i.test(`${sourceOf(s)} ${ambientOf(s)}`),
  },
  {
    id: 'hydrogen',
    title: 'Hydrogen and pyrogenic steam',
    text:
      'Wet oxidation by pyrogenic steam burns hydrogen in oxygen at the torch; hydrogen is flammable over a wide range of ' +
      'mixtures and its flame is nearly invisible. Run only with the torch interlocks, flame sensing and exhaust working; never ' +
      'bypass the ignition or H2/O2 ratio interlocks, and report any hydrogen alarm at once.',
    applies: (s) => /\bH2(?!O)|hydrogen|pyrogenic|forming gas/i.test(ambientOf(s)) || (s.kind === 'oxidation' && /wet|steam/i.test(ambientOf(s))),
  },
  {
    id: 'chlorinated-ambient',
    title: 'Chlorinated ambient (HCl, TCA, DCE)',
    text:
      'Chlorine-bearing additives to the oxidation ambient are corrosive and toxic and form HCl in the tube. Keep the tube exhaust ' +
      'and scrubber running, and check for leaks at the source cabinet and end cap.',
    applies: (s) => /\bHCl\b|\bTCA\b|\bDCE\b|chlor/i.test(ambientOf(s)),
  },
  {
    id: 'hot-furnace',
    title: 'Hot furnace and quartzware',
    text:
      'Tubes run near 1000 °C, and the boat, paddle, end cap and wafers stay hot long after unload. Load and unload with the ' +
      'proper hooks or boat puller, heat-resistant gloves and face shield; push and pull at the set rates to avoid thermal shock ' +
      'to wafers and quartz; set hot quartz down only on heat-rated surfaces and mark it hot.',
    applies: isFurnaceStep,
  },
  {
    id: 'implanter',
    title: 'Ion implanter',
    text:
      'Implanters use high voltages and produce X-rays; keep interlocks and shielding in place, and leave the source, beam line ' +
      'and high-voltage areas to trained, authorised staff. Ion-source gases and residues (arsenic, phosphorus, boron compounds) ' +
      "are toxic: follow the implanter's gas-handling and maintenance procedures.",
    applies: (s) => s.kind === 'implant',
  },
  {
    id: 'solid-source',
    title: 'Solid planar sources',
    text:
      'Source wafers are brittle and their surfaces carry dopant oxides. Handle them with tools and gloves, keep them dry and ' +
      'stored as the supplier directs, and clean up broken pieces without raising or breathing dust.',
    applies: (s) => /solid|planar|\bBN\b|nitride|source wafer/i.test(sourceOf(s)),
  },
  {
    id: 'as-sb-residues',
    title: 'Arsenic and antimony residues',
    text:
      "Arsenic and antimony compounds are toxic. Tube, quartzware and exhaust deposits from As or Sb steps need the site's " +
      'contaminated-parts practice during cleaning and maintenance.',
    applies: (s) => (s.dopant === 'As' || s.dopant === 'Sb') && s.kind !== 'implant',
  },
];

/**
 * The cautions that apply to a recipe's steps, in print order (most acute first),
 * each listing the step indices that call for it. The deferral sentence is not an
 * item: it is `SAFETY_DEFERRAL`, printed after the items on every traveller.
 */
export function safetyItemsFor(steps: readonly TravellerStep[]): SafetyItem[] {
  return RULES.flatMap((rule) => {
    const hits = steps.filter((s) => rule.applies(s)).map((s) => s.index);
    return hits.length ? [{ id: rule.id, title: rule.title, text: rule.text, steps: hits }] : [];
  });
}
