// Live prediction in the browser: the same engine the server runs, over the
// parsed form. The first change after a pause runs at once (so a single
// keystroke shows its effect in one frame); changes during fast typing
// coalesce into one run DEBOUNCE_MS after the last. Each run is timed, and a
// performance mark 'tw-preview-updated' is set once the DOM shows the result
// (the client benchmark reads it).
import { nextTick, onScopeDispose, ref, shallowRef, toValue, watch, type MaybeRefOrGetter, type WatchSource } from 'vue';
import { computeRecipe, EngineInputError, type SolverTuning, type TubeFactors } from '../../shared/engine';
import type { RecipeResult } from '../../shared/engine/types';
import type { ParseRecipeResult, RecipeIssue } from '../../shared/schemas/recipe';

export const DEBOUNCE_MS = 120;
/** Budget per update, ms: past it the solver drops to PREVIEW_TUNING until the path is analytic again. */
export const PREVIEW_BUDGET_MS = 50;
/** A coarser grid for the preview only (≈2 % on junction depth in our runs); saving computes at full resolution. */
export const PREVIEW_TUNING: SolverTuning = { gridNodes: 200, timeSteps: 40 };
export const PREVIEW_MARK = 'tw-preview-updated';

export interface PreviewState {
  result: RecipeResult | null;
  /** Engine refusal of otherwise valid input (e.g. a resistivity the standard does not cover). */
  engineIssue: RecipeIssue | null;
}

/** Runs the engine once and reports what the workspace shows; never throws for input problems. */
export function runPreview(parsed: ParseRecipeResult, tuning: SolverTuning = {}): PreviewState & { ms: number } {
  const t0 = performance.now();
  if (!parsed.ok) return { result: null, engineIssue: null, ms: performance.now() - t0 };
  try {
    const result = computeRecipe(parsed.doc, tuning);
    return { result, engineIssue: null, ms: performance.now() - t0 };
  } catch (error) {
    if (error instanceof EngineInputError) {
      return { result: null, engineIssue: { path: error.path, message: error.message }, ms: performance.now() - t0 };
    }
    throw error;
  }
}

/** `tubeFactors`: the tube calibrations in force (GET /api/calibrations/active); used only by documents that opt in. */
export function useRecipePreview(parsed: WatchSource<ParseRecipeResult>, enabled: WatchSource<boolean>, tubeFactors: MaybeRefOrGetter<TubeFactors> = {}) {
  const result = shallowRef<RecipeResult | null>(null);
  const engineIssue = ref<RecipeIssue | null>(null);
  /** The form does not parse: the shown result is the last valid one. */
  const stale = ref(false);
  const computeMs = ref<number | null>(null);
  const coarse = ref(false);
  const updates = ref(0);

  let timer: ReturnType<typeof setTimeout> | null = null;
  let lastRunAt = -Infinity;
  let latest: ParseRecipeResult | null = null;
  let active = false;

  function run(): void {
    if (!latest) return;
    lastRunAt = performance.now();
    if (!latest.ok) {
      stale.value = result.value !== null;
      return;
    }
    const state = runPreview(latest, { ...(coarse.value ? PREVIEW_TUNING : {}), tubeFactors: toValue(tubeFactors) });
    computeMs.value = state.ms;
    engineIssue.value = state.engineIssue;
    stale.value = state.result === null && result.value !== null;
    if (state.result) {
      result.value = state.result;
      // Full resolution took too long on the numerical path: preview coarser until it is analytic again.
      if (state.result.method === 'analytic') coarse.value = false;
      else if (!coarse.value && state.ms > PREVIEW_BUDGET_MS) coarse.value = true;
    }
    updates.value += 1;
    void nextTick(() => performance.mark(PREVIEW_MARK, { detail: { computeMs: state.ms } }));
  }

  function schedule(): void {
    if (!active) return;
    if (timer === null && performance.now() - lastRunAt >= DEBOUNCE_MS) {
      run();
      return;
    }
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(() => {
      timer = null;
      run();
    }, DEBOUNCE_MS);
  }

  watch(
    parsed,
    (p) => {
      latest = p;
      schedule();
    },
    { immediate: true },
  );
  watch(
    enabled,
    (on) => {
      active = on;
      if (on) run();
    },
    { immediate: true },
  );
  // Factors arrive after the first run (or change after a fit): predict again with them.
  watch(() => toValue(tubeFactors), () => active && run());

  /** Forgets the shown result (e.g. another version was loaded). */
  function reset(): void {
    result.value = null;
    engineIssue.value = null;
    stale.value = false;
    coarse.value = false;
  }

  onScopeDispose(() => {
    if (timer !== null) clearTimeout(timer);
  });

  return { result, engineIssue, stale, computeMs, coarse, updates, reset };
}
