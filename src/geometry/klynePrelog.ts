/**
 * Klyne–Prelog descriptors (Klyne & Prelog 1960; IUPAC Gold Book T06406) with half-open boundaries
 * (common practice, no source): sp |τ| < 30; sc 30 ≤ |τ| < 90; ac 90 ≤ |τ| < 150; ap |τ| ≥ 150.
 */

export type KlynePrelog = 'sp' | '+sc' | '-sc' | '+ac' | '-ac' | 'ap';
/** The plain words used beside the descriptor. */
export type TorsionRelation = 'eclipsed' | 'gauche' | 'anticlinal' | 'anti';

/**
 * Klyne–Prelog descriptor of a torsion in degrees.
 * @example klynePrelog(-62) // '-sc'
 */
export function klynePrelog(deg: number): KlynePrelog {
  const a = Math.abs(deg);
  if (a < 30) return 'sp';
  if (a >= 150) return 'ap';
  const sign = deg < 0 ? '-' : '+';
  return a < 90 ? `${sign}sc` : `${sign}ac`;
}

/** Relation word for a torsion in degrees: eclipsed (sp), gauche (sc), anticlinal (ac), anti (ap). */
export function torsionRelation(deg: number): TorsionRelation {
  const a = Math.abs(deg);
  if (a < 30) return 'eclipsed';
  if (a < 90) return 'gauche';
  if (a < 150) return 'anticlinal';
  return 'anti';
}
