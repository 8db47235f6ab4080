// How numbers read on screen: engineering magnitudes as mantissa × 10ⁿ,
// lengths and resistances with a fixed number of significant digits. Every
// figure is shown with its unit by the caller; missing values read '—'.
const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
};

export const DASH = '—';

const missing = (x: number | null | undefined): x is null | undefined => x === null || x === undefined || !Number.isFinite(x);

/** 1.23×10¹⁹ (3 significant digits by default); 0 reads '0'. */
export function formatSci(x: number | null | undefined, digits = 3): string {
  if (missing(x)) return DASH;
  if (x === 0) return '0';
  const [mantissa, exponent] = x.toExponential(digits - 1).split('e');
  const exp = String(Number(exponent));
  if (exp === '0') return mantissa;
  return `${mantissa}×10${[...exp].map((c) => SUPERSCRIPT[c]).join('')}`;
}

/** A plain decimal with `sig` significant digits and no exponent: 2.125, 0.04567, 116.8. */
export function formatSig(x: number | null | undefined, sig = 4): string {
  if (missing(x)) return DASH;
  if (x === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(x)));
  const decimals = Math.min(8, Math.max(0, sig - 1 - magnitude));
  return x.toFixed(decimals);
}

/** A plain number with at most `sig` significant digits and no trailing zeros: 80, 0.2465. */
export function formatPlain(x: number | null | undefined, sig = 4): string {
  if (missing(x)) return DASH;
  return String(Number(x.toPrecision(sig)));
}

/** A value with a sign in front (+ or −), for differences. */
export function formatSigned(text: string, x: number | null | undefined): string {
  if (missing(x) || text === DASH) return DASH;
  if (x > 0) return `+${text}`;
  return text.replace(/^-/, '−');
}

/** Text for a form field from a stored number: compact exponent form for large or tiny magnitudes. */
export function toFieldText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value !== 'number') return String(value);
  if (value !== 0 && (Math.abs(value) >= 1e6 || Math.abs(value) < 1e-4)) {
    return value.toExponential().replace('e+', 'e');
  }
  return String(Number(value.toPrecision(12)));
}

/** Milliseconds for the preview timing line: 0.8 ms, 12.3 ms. */
export function formatMs(ms: number | null | undefined): string {
  return missing(ms) ? DASH : `${ms.toFixed(1)} ms`;
}

/** A safe file name stem from a recipe name: lower case, words joined with '-'. */
export function fileStem(name: string): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return stem || 'recipe';
}

/** A difference with its sign: +0.125, −3.40, 0. */
export function formatDeltaSig(x: number | null | undefined, sig = 3): string {
  return formatSigned(formatSig(x, sig), x);
}

/** A difference in mantissa × 10ⁿ form with its sign: +1.20×10⁻¹⁰, −3.00×10⁻¹¹. */
export function formatDeltaSci(x: number | null | undefined, digits = 3): string {
  if (missing(x)) return DASH;
  if (x === 0) return '0';
  return `${x > 0 ? '+' : '−'}${formatSci(Math.abs(x), digits)}`;
}

/** A percentage difference in brackets with its sign, or '' when unknown: ' (+12.5 %)'. */
export function formatDeltaPercent(x: number | null | undefined): string {
  return missing(x) ? '' : ` (${formatSigned(x.toFixed(1), x)} %)`;
}
