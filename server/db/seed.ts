// The demo scenario: an invented pilot line ("Harbourside Pilot Line"). Every
// person, tube and number here is made up for the demo and marked as such.
import { eq } from 'drizzle-orm';
import type { CreateTubeInput } from '../../shared/schemas/tubes';
import type { Role } from '../../shared/schemas/users';
import type { Db } from './index';
import { tubes, users } from './schema';
import { hashPassword } from '../services/passwords';
import { recordAudit } from '../services/audit.service';

export interface DemoPerson {
  email: string;
  name: string;
  role: Role;
  password: string;
}

/** Invented demo people; the start command prints these sign-ins. */
export const DEMO_PEOPLE: DemoPerson[] = [
  { email: 'engineer@pilotline.example', name: 'Noor Haddad', role: 'engineer', password: 'demo-engineer-1' },
  { email: 'engineer2@pilotline.example', name: 'Tomás Reyes', role: 'engineer', password: 'demo-engineer-2' },
  { email: 'lead@pilotline.example', name: 'Ingrid Solberg', role: 'lead', password: 'demo-lead-pass' },
  { email: 'lead2@pilotline.example', name: 'Kwame Mensah', role: 'lead', password: 'demo-lead-pass2' },
  { email: 'operator@pilotline.example', name: 'Priya Raman', role: 'operator', password: 'demo-operator-1' },
  { email: 'admin@pilotline.example', name: 'Jonas Weber', role: 'admin', password: 'demo-admin-pass' },
];

/** Invented demo tubes of the pilot line. */
export const DEMO_TUBES: CreateTubeInput[] = [
  {
    name: 'Tube 1 · boron',
    dedication: 'p-type',
    minTempC: 800,
    maxTempC: 1150,
    ambients: ['inert', 'dry-o2'],
    notes: 'Boron predeposition and drive-in. Demo data (invented).',
  },
  {
    name: 'Tube 2 · phosphorus',
    dedication: 'n-type',
    minTempC: 800,
    maxTempC: 1150,
    ambients: ['inert', 'dry-o2'],
    notes: 'POCl3 predeposition and n-type drive-in. Demo data (invented).',
  },
  {
    name: 'Tube 3 · anneal',
    dedication: 'undoped',
    minTempC: 600,
    maxTempC: 1200,
    ambients: ['inert', 'dry-o2', 'wet-o2'],
    notes: 'Post-implant anneal and drive-in, no dopant source. Demo data (invented).',
  },
  {
    name: 'Tube 4 · oxidation',
    dedication: 'undoped',
    minTempC: 800,
    maxTempC: 1200,
    ambients: ['dry-o2', 'wet-o2'],
    notes: 'Dry and pyrogenic wet oxidation. Demo data (invented).',
  },
];

/** Inserts what is missing of the demo scenario; running it twice changes nothing. */
export async function seedDemo(db: Db): Promise<{ created: number }> {
  let created = 0;
  for (const p of DEMO_PEOPLE) {
    const [exists] = await db.select({ id: users.id }).from(users).where(eq(users.email, p.email)).limit(1);
    if (exists) continue;
    const passwordHash = await hashPassword(p.password);
    await db.transaction(async (tx) => {
      const [{ id }] = await tx.insert(users).values({ email: p.email, name: p.name, role: p.role, passwordHash }).$returningId();
      await recordAudit(tx, { actor: null, action: 'person.create', entityType: 'user', entityId: id, details: { email: p.email, role: p.role, seed: true } });
    });
    created++;
  }
  for (const t of DEMO_TUBES) {
    const [exists] = await db.select({ id: tubes.id }).from(tubes).where(eq(tubes.name, t.name)).limit(1);
    if (exists) continue;
    await db.insert(tubes).values(t);
    created++;
  }
  return { created };
}
