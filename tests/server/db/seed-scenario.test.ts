import { describe, expect, it, inject } from 'vitest';
import { connectDatabase } from '../../../server/db/index';
import { seedDemo } from '../../../server/db/seed';
import { seedScenario } from '../../../server/db/seed-scenario';
import { calibrations, lots, measurements, recipes, recipeVersions } from '../../../server/db/schema';
import { resetDatabase } from '../../support/test-app';

describe('demo scenario seed', () => {
  it('adds recipes of all four dopants with versions in every state and lots, once', async () => {
    const database = connectDatabase(inject('databaseUrl'), 2);
    await resetDatabase(database);
    await seedDemo(database.db);
    const first = await seedScenario(database.db);
    expect(first.created).toBe(5);
    const all = await database.db.select().from(recipes);
    expect(new Set(all.flatMap((r) => r.dopants.split(',').filter(Boolean)))).toEqual(new Set(['B', 'P', 'As', 'Sb']));
    const states = new Set((await database.db.select().from(recipeVersions)).map((v) => v.state));
    expect(states).toEqual(new Set(['draft', 'in_review', 'released', 'retired']));
    expect(all.some((r) => r.latestVersionNo >= 3)).toBe(true);
    expect(await database.db.select().from(lots)).toHaveLength(4);
    expect(await database.db.select().from(measurements)).toHaveLength(6);
    expect(await database.db.select().from(calibrations)).toHaveLength(1);
    expect((await seedScenario(database.db)).created).toBe(0);
    expect(await database.db.select().from(recipes)).toHaveLength(5);
    await database.close();
  });
});
