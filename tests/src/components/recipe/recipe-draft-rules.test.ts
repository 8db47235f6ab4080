import { describe, expect, it } from 'vitest';
import {
  documentDopants,
  exportFileName,
  fieldDomId,
  isDirty,
  issuesByPath,
  messagesUnder,
  readOnlyReason,
  stableJson,
  toEditable,
} from '../../../../src/components/recipe/recipe-draft-rules';
import { parseRecipeDocument, type RecipeDocument } from '../../../../shared/schemas/recipe';
import { boronTwoStep } from '../../../support/sample-recipes';

function saved(): RecipeDocument {
  const parsed = parseRecipeDocument(boronTwoStep({ boron: 1, anneal: 3 }));
  if (!parsed.ok) throw new Error('sample does not parse');
  return parsed.doc;
}

describe('isDirty', () => {
  it('is clean when the form parses to the saved document, whatever the key order', () => {
    const form = toEditable(saved());
    const reordered = JSON.parse(stableJson(form));
    expect(isDirty(parseRecipeDocument(reordered), saved())).toBe(false);
  });

  it('is clean when the stored document leaves defaults out', () => {
    const sparse = boronTwoStep({ boron: 1, anneal: 3 }) as unknown as RecipeDocument;
    expect(isDirty(parseRecipeDocument(toEditable(saved())), sparse)).toBe(false);
  });

  it('is clean when a number was typed back as the same text with a unit', () => {
    const form = toEditable(saved());
    form.steps[1].timeMin = '1 h';
    expect(isDirty(parseRecipeDocument(form), saved())).toBe(false);
  });

  it('is dirty after a change, and while the form does not parse', () => {
    const form = toEditable(saved());
    form.steps[1].timeMin = '90';
    expect(isDirty(parseRecipeDocument(form), saved())).toBe(true);
    form.steps[1].timeMin = 'ninety';
    expect(isDirty(parseRecipeDocument(form), saved())).toBe(true);
  });
});

describe('readOnlyReason', () => {
  const draft = { state: 'draft' as const, versionNo: 3, author: { id: 7, name: 'Noor Haddad' } };

  it('lets the author (engineer) and any lead edit a draft', () => {
    expect(readOnlyReason(draft, { id: 7, role: 'engineer' })).toBeNull();
    expect(readOnlyReason(draft, { id: 99, role: 'lead' })).toBeNull();
  });

  it.each([
    [{ ...draft, state: 'released' as const }, { id: 7, role: 'engineer' as const }, /version 3 is Released/],
    [draft, { id: 8, role: 'engineer' as const }, /belongs to Noor Haddad/],
    [draft, { id: 1, role: 'operator' as const }, /role \(operator\)/],
    [draft, { id: 2, role: 'admin' as const }, /role \(admin\)/],
  ])('says why %o is read only for %o', (version, user, reason) => {
    expect(readOnlyReason(version, user)).toMatch(reason);
  });
});

describe('issue paths', () => {
  it('keeps the first message per path and strips the server prefix', () => {
    const byPath = issuesByPath(
      [
        { path: 'document.steps.0.tempC', message: 'Temperature must be between 500 and 1300 °C' },
        { path: 'document.steps.0.tempC', message: 'second' },
        { path: 'name', message: 'Enter a name' },
      ],
      'document.',
    );
    expect(byPath).toEqual({ 'steps.0.tempC': 'Temperature must be between 500 and 1300 °C', name: 'Enter a name' });
  });

  it('collects the messages of a step and its nested fields, not of a neighbour', () => {
    const byPath = { 'steps.1': 'a', 'steps.1.surface.mode': 'b', 'steps.10.tempC': 'c' };
    expect(messagesUnder(byPath, 'steps.1')).toEqual(['a', 'b']);
  });

  it('gives each document path a DOM id', () => {
    expect(fieldDomId('steps.2.surface.concentration')).toBe('f-steps-2-surface-concentration');
  });
});

describe('exports and dopants', () => {
  it('names export files after the recipe and version', () => {
    expect(exportFileName('Base diffusion · boron', 3, 'recipe')).toBe('base-diffusion-boron-v3.recipe.json');
    expect(exportFileName('Base diffusion · boron', 3, 'profile')).toBe('base-diffusion-boron-v3-profile.csv');
  });

  it('lists the dopants of a document in the engine order', () => {
    const steps = [{ kind: 'implant', dopant: 'As' }, { kind: 'anneal' }, { kind: 'predeposition', dopant: 'B' }] as never;
    expect(documentDopants({ steps })).toEqual(['B', 'As']);
  });
});
