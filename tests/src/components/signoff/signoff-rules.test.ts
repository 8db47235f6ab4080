import { describe, expect, it } from 'vitest';
import type { VersionState } from '../../../../shared/schemas/recipes-api';
import type { Role } from '../../../../shared/schemas/users';
import { meaningLabel, pathCandidates, reviewLocation, shortHash, signoffPermissions, stepIssues } from '../../../../src/components/signoff/signoff-rules';

const AUTHOR = 7;
const version = (state: VersionState) => ({ state, author: { id: AUTHOR, name: 'Author' } });
const viewer = (role: Role, mine: boolean) => ({ id: mine ? AUTHOR : 99, role });

// The same rules as the sign-off service and the role matrix: author or lead submits,
// a lead who did not write it signs or returns, a lead retires.
describe('who may take which sign-off step', () => {
  it.each([
    { state: 'draft', role: 'engineer', mine: true, offered: ['submit'] },
    { state: 'draft', role: 'engineer', mine: false, offered: [] },
    { state: 'draft', role: 'lead', mine: false, offered: ['submit'] },
    { state: 'draft', role: 'operator', mine: false, offered: [] },
    { state: 'draft', role: 'admin', mine: false, offered: [] },
    { state: 'in_review', role: 'lead', mine: false, offered: ['sign', 'returnToDraft'] },
    { state: 'in_review', role: 'lead', mine: true, offered: ['waitsForAnotherLead'] },
    { state: 'in_review', role: 'engineer', mine: true, offered: [] },
    { state: 'in_review', role: 'admin', mine: false, offered: [] },
    { state: 'released', role: 'lead', mine: true, offered: ['retire'] },
    { state: 'released', role: 'engineer', mine: true, offered: [] },
    { state: 'retired', role: 'lead', mine: false, offered: [] },
  ] as const)('$state, $role (author: $mine) → $offered', ({ state, role, mine, offered }) => {
    const can = signoffPermissions(version(state), viewer(role, mine));
    expect(Object.entries(can).filter(([, yes]) => yes).map(([k]) => k).sort()).toEqual([...offered].sort());
  });

  it('offers nothing to nobody', () => {
    expect(Object.values(signoffPermissions(version('draft'), null)).some(Boolean)).toBe(false);
  });
});

describe('refused submissions point at steps', () => {
  it('maps tube-rule and engine issues to step numbers, recipe-wide ones first', () => {
    const issues = stepIssues([
      { path: 'steps.2.tubeId', message: 'Tube 1 is dedicated to p-type' },
      { path: 'document.steps.0.tempC', message: 'Above the tube range' },
      { path: 'substrate', message: 'Background missing' },
    ]);
    expect(issues).toEqual([
      { step: null, path: 'substrate', message: 'Background missing' },
      { step: 0, path: 'steps.0.tempC', message: 'Above the tube range' },
      { step: 2, path: 'steps.2.tubeId', message: 'Tube 1 is dedicated to p-type' },
    ]);
  });

  it('looks for the field, then its step', () => {
    expect(pathCandidates('steps.1.surface.mode')).toEqual(['steps.1.surface.mode', 'steps.1.surface', 'steps.1', 'steps']);
  });
});

describe('words and links', () => {
  it('labels stored signature meanings and keeps unknown ones', () => {
    expect(meaningLabel('approved-for-engineering-lots')).toBe('Reviewed and approved for engineering lots only');
    expect(meaningLabel('legacy-meaning')).toBe('legacy-meaning');
    expect(meaningLabel(null)).toBe('');
  });

  it('shortens a content hash and marks the cut', () => {
    expect(shortHash('5c299ba8534c61d5aa00')).toBe('5c299ba853…');
    expect(shortHash('abc')).toBe('abc');
    expect(shortHash(null)).toBe('—');
  });

  it('reviews against the released version, or in the workspace when there is none', () => {
    expect(reviewLocation({ recipeId: 1, versionId: 9, releasedVersionId: 4 })).toEqual({ name: 'compare', query: { a: '4', b: '9' } });
    expect(reviewLocation({ recipeId: 1, versionId: 9, releasedVersionId: null })).toEqual({ name: 'recipe', params: { id: '1' }, query: { version: '9' } });
  });
});
