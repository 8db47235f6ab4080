// The mathjs unit reader for quantities written with units ("1050 degC",
// "30 min", "5e15 cm^-2"). Importing this module installs it. Only mathjs's
// unit factory is pulled in (create() with unitDependencies), not the whole
// expression engine.
import { create, unitDependencies } from 'mathjs';
import { installUnitReader } from './quantity';

const math = create({ unitDependencies });

/** "950 degC" → 950 in 'degC'; null when the text has a unit but no number; throws when unreadable. */
export function readWithMathjs(text: string, unit: string): number | null {
  const u = math.unit(text);
  return u.value === null ? null : u.toNumber(unit);
}

installUnitReader(readWithMathjs);
