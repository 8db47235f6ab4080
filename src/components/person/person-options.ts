// Options of a "which person" filter (recipe owner, audit actor). The signed-in
// person comes first so "mine" is one click; people whose account is closed
// stay pickable, since their recipes and audit rows remain, but go last.
import type { PersonRef } from '../../../shared/schemas/recipes-api';

export interface PersonOption {
  value: number;
  label: string;
}

type Person = PersonRef & { active?: boolean };

/** Me first, then active people by name, then inactive ones; each person once. */
export function personOptions(people: readonly Person[], me: PersonRef | null = null): PersonOption[] {
  const byId = new Map<number, Person>();
  for (const p of people) if (!byId.has(p.id)) byId.set(p.id, p);
  const others = [...byId.values()]
    .filter((p) => p.id !== me?.id)
    .sort((a, b) => Number(b.active !== false) - Number(a.active !== false) || a.name.localeCompare(b.name));
  const options = others.map((p) => ({ value: p.id, label: p.active === false ? `${p.name} (inactive)` : p.name }));
  return me ? [{ value: me.id, label: `${byId.get(me.id)?.name ?? me.name} (me)` }, ...options] : options;
}
