import { describe, expect, it } from 'vitest';
import { issuesToFieldErrors } from '../../../src/composables/use-api-error';

describe('issuesToFieldErrors', () => {
  it.each([
    {
      name: 'a top-level field',
      issues: [{ path: 'name', message: 'Enter a name' }],
      fields: { name: 'Enter a name' },
      rest: [],
    },
    {
      name: 'a nested path under its top-level field',
      issues: [{ path: 'ambients.1', message: 'Choose one of the options' }],
      fields: { ambients: 'Choose one of the options' },
      rest: [],
    },
    {
      name: 'only the first message of a field',
      issues: [
        { path: 'email', message: 'first' },
        { path: 'email', message: 'second' },
      ],
      fields: { email: 'first' },
      rest: [],
    },
    {
      name: 'a form-level issue (empty path) as rest',
      issues: [{ path: '', message: 'Change at least one field' }],
      fields: {},
      rest: [{ path: '', message: 'Change at least one field' }],
    },
  ])('maps $name', ({ issues, fields, rest }) => {
    expect(issuesToFieldErrors(issues)).toEqual({ fields, rest });
  });

  it('keeps issues for fields the form does not have', () => {
    const issues = [{ path: 'id', message: 'Expected a number' }, { path: 'name', message: 'Enter a name' }];
    expect(issuesToFieldErrors(issues, ['name'])).toEqual({
      fields: { name: 'Enter a name' },
      rest: [{ path: 'id', message: 'Expected a number' }],
    });
  });
});
