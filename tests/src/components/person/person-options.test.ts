import { describe, expect, it } from 'vitest';
import { personOptions } from '../../../../src/components/person/person-options';

const people = [
  { id: 3, name: 'Zoe Lead', active: true },
  { id: 1, name: 'Ada Engineer', active: true },
  { id: 7, name: 'Bea Former', active: false },
  { id: 2, name: 'Mo Engineer', active: true },
];

describe('options of a person filter', () => {
  it('puts me first, then active people by name, then inactive ones marked as such', () => {
    expect(personOptions(people, { id: 2, name: 'Mo Engineer' })).toEqual([
      { value: 2, label: 'Mo Engineer (me)' },
      { value: 1, label: 'Ada Engineer' },
      { value: 3, label: 'Zoe Lead' },
      { value: 7, label: 'Bea Former (inactive)' },
    ]);
  });

  it('offers me even before the directory has loaded, and lists each person once', () => {
    expect(personOptions([], { id: 2, name: 'Mo' })).toEqual([{ value: 2, label: 'Mo (me)' }]);
    expect(personOptions([...people, { id: 1, name: 'Ada Engineer', active: true }]).map((o) => o.value)).toEqual([1, 2, 3, 7]);
  });
});
