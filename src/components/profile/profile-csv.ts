// The profile export: one row per depth, every column with its unit in the
// header, values in full precision so a spreadsheet or a SIMS overlay reads
// the same numbers the screen shows.
import type { ProfileResult } from '../../../shared/engine/types';

/** CSV text: depth_um, one column per dopant in cm⁻³, then the signed net doping in cm⁻³. */
export function profileCsv(profile: ProfileResult): string {
  const header = ['depth_um', ...profile.dopants.map((d) => `${d.dopant}_cm-3`), 'net_cm-3'];
  const lines = [header.join(',')];
  profile.depthUm.forEach((depth, i) => {
    const row = [depth, ...profile.dopants.map((d) => d.concentrationCm3[i]), profile.netCm3[i]];
    lines.push(row.map((x) => String(x)).join(','));
  });
  return `${lines.join('\n')}\n`;
}
