// Public API of the engine: pure functions over plain data, the same in the browser,
// on the server, in the command line and in the tests.

// Materials layer: constants, dopants, parameter sets and published material models.
export * from './constants';
export * from './errors';
export * from './dopants';
export * from './parameter-sets';
export * from './diffusivity';
export * from './intrinsic-carriers';
export * from './solid-solubility';
export * from './mobility';
export * from './resistivity';
export * from './special-functions';
export * from './oxidation';
export * from './implant-table';

// Process layer: thermal budget, profiles, solver, junctions, the layer, the recipe.
export * from './types';
export * from './thermal-budget';
export * from './profiles-analytic';
export * from './solver-fd';
export * from './junctions';
export * from './layer';
export * from './oxidation-effect';
export * from './result-guard';
export { planSteps, recipeDopants, calibrationFactor, type StepPlan, type DopantDt, type OxideGrowth, type TubeFactors } from './step-plan';
export { computeRecipe, type SolverTuning } from './compute-recipe';
