import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { effectScope, nextTick, ref } from 'vue';
import { computeRecipe } from '../../../shared/engine';
import { parseRecipeDocument, type ParseRecipeResult } from '../../../shared/schemas/recipe';
import { DEBOUNCE_MS, PREVIEW_MARK, runPreview, useRecipePreview } from '../../../src/composables/use-recipe-preview';
import { boronTwoStep } from '../../support/sample-recipes';

function parsedWithDrive(timeMin: number | string): ParseRecipeResult {
  const input = boronTwoStep({ boron: 1, anneal: 3 });
  return parseRecipeDocument({ ...input, steps: input.steps.map((s) => (s.kind === 'anneal' ? { ...s, timeMin } : s)) });
}

describe('runPreview', () => {
  it('gives the same result as the engine, with its timing', () => {
    const parsed = parsedWithDrive(60);
    const state = runPreview(parsed);
    if (!parsed.ok) throw new Error('sample does not parse');
    expect(state.result).toEqual(computeRecipe(parsed.doc));
    expect(state.ms).toBeGreaterThanOrEqual(0);
  });

  it('turns an engine refusal into an issue at its path instead of throwing', () => {
    const parsed = parsedWithDrive(60);
    if (!parsed.ok) throw new Error('sample does not parse');
    // The schema never lets an unknown set through; the engine still refuses one by path.
    const state = runPreview({ ok: true, doc: { ...parsed.doc, parameterSet: 'no-such-set' } });
    expect(state.result).toBeNull();
    expect(state.engineIssue?.path).toBe('parameterSet');
  });

  it('computes nothing for a form that does not parse', () => {
    expect(runPreview(parsedWithDrive('soon')).result).toBeNull();
  });
});

describe('useRecipePreview', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  function setup() {
    const parsed = ref(parsedWithDrive(60));
    const enabled = ref(true);
    const scope = effectScope();
    const preview = scope.run(() => useRecipePreview(parsed, enabled))!;
    return { parsed, enabled, preview, scope };
  }
  const xj = (p: ReturnType<typeof setup>['preview']) => p.result.value?.final.junctionDepthsUm[0] ?? null;

  it('computes at once when enabled', () => {
    const { preview, scope } = setup();
    expect(xj(preview)).toBeGreaterThan(0);
    expect(preview.computeMs.value).not.toBeNull();
    scope.stop();
  });

  it('runs the first change after a pause at once, and coalesces a burst into one run after the debounce', async () => {
    const { parsed, preview, scope } = setup();
    const at60 = xj(preview)!;
    vi.advanceTimersByTime(DEBOUNCE_MS + 1);
    parsed.value = parsedWithDrive(120);
    await nextTick();
    const at120 = xj(preview)!;
    expect(at120).toBeGreaterThan(at60); // leading edge: no wait
    const runs = preview.updates.value;
    parsed.value = parsedWithDrive(10);
    await nextTick();
    parsed.value = parsedWithDrive(5);
    await nextTick();
    expect(preview.updates.value).toBe(runs); // within the debounce: not yet
    vi.advanceTimersByTime(DEBOUNCE_MS);
    expect(preview.updates.value).toBe(runs + 1);
    expect(xj(preview)!).toBeLessThan(at60);
    scope.stop();
  });

  it('keeps the last valid result, marked stale, while the form does not parse', async () => {
    const { parsed, preview, scope } = setup();
    vi.advanceTimersByTime(DEBOUNCE_MS + 1);
    const before = preview.result.value;
    parsed.value = parsedWithDrive('');
    await nextTick();
    expect(preview.result.value).toBe(before);
    expect(preview.stale.value).toBe(true);
    scope.stop();
  });

  it('sets the performance mark the client benchmark reads after each update', async () => {
    vi.useRealTimers(); // the mark lives in the real performance timeline
    performance.clearMarks(PREVIEW_MARK);
    const { parsed, scope } = setup();
    await nextTick();
    await new Promise((r) => setTimeout(r, DEBOUNCE_MS + 10));
    parsed.value = parsedWithDrive(90);
    await nextTick();
    await nextTick();
    const marks = performance.getEntriesByName(PREVIEW_MARK) as PerformanceMark[];
    expect(marks).toHaveLength(2);
    expect((marks[1].detail as { computeMs: number }).computeMs).toBeGreaterThanOrEqual(0);
    scope.stop();
  });

  it('does nothing while disabled (a read-only version shows its stored result)', async () => {
    const { parsed, enabled, preview, scope } = setup();
    enabled.value = false;
    await nextTick();
    const runs = preview.updates.value;
    parsed.value = parsedWithDrive(30);
    await nextTick();
    vi.advanceTimersByTime(DEBOUNCE_MS * 2);
    expect(preview.updates.value).toBe(runs);
    scope.stop();
  });
});
