import { describe, expect, it } from 'vitest';
import { auditExportUrl } from '../../../src/api/audit';
import { toQueryString } from '../../../src/api/query-string';

describe('query strings of list requests', () => {
  it.each([
    { query: {}, expected: '' },
    { query: { status: 'open' }, expected: '?status=open' },
    { query: { a: undefined, b: null, c: '', d: 0 }, expected: '?d=0' },
    { query: { name: 'Base · boron & co' }, expected: '?name=Base+%C2%B7+boron+%26+co' },
  ])('$query → "$expected"', ({ query, expected }) => {
    expect(toQueryString(query)).toBe(expected);
  });

  it('exports the audit trail with the filters but without the page', () => {
    expect(auditExportUrl({ page: 3, pageSize: 50, entityType: 'lot', entityId: 4 })).toBe('/api/audit/export.csv?entityType=lot&entityId=4');
  });
});
