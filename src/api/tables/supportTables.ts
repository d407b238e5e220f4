/**
 * Supporting-information tables from analysed records: torsions (ring torsions and each drawn bond's pair
 * torsions, with Klyne–Prelog descriptors), Cremer–Pople puckering, ring shapes, substituent positions and
 * ring ³J(H,H). Atoms are 1-based, angles in degrees, Q in Å, J in Hz, energies in kcal/mol.
 */
import { klynePrelog, torsionRelation } from '../../geometry/klynePrelog.js';
import { wrap180 } from '../../geometry/vec3.js';
import type { Table, TableCell } from './tableText.js';
import type { RecordAnalysis } from '../recordAnalysis.js';

const atoms = (xs: readonly number[]) => xs.map((a) => a + 1).join('-');
const kp = (deg: number | null) => (deg === null ? null : klynePrelog(deg));
const rel = (deg: number | null) => (deg === null ? null : torsionRelation(deg));

const COUPLING_NAMES: Record<string, string> = {
  'haasnoot-1980': 'generalised Karplus equation of Haasnoot, de Leeuw and Altona (1980)',
};

function torsions(records: readonly RecordAnalysis[]): Table {
  const rows: TableCell[][] = [];
  for (const r of records) {
    for (const ring of r.rings) {
      for (const t of ring.torsions) rows.push([r.record, `ring ${ring.id}`, atoms(t.atoms), t.angleDeg, kp(t.angleDeg), rel(t.angleDeg)]);
    }
    for (const { bond, view } of r.bonds) {
      for (const p of view.pairs) {
        const deg = p.torsionDeg === null ? null : wrap180(p.torsionDeg);
        rows.push([r.record, `bond ${atoms(bond)}`, atoms([p.front, bond[0], bond[1], p.back]), deg, p.klynePrelog, p.relation]);
      }
    }
  }
  return {
    kind: 'torsions',
    caption: 'Torsion angles: ring torsions and the substituent pairs of each drawn bond, with Klyne–Prelog descriptors.',
    columns: [
      { key: 'record', label: 'record' },
      { key: 'source', label: 'ring or bond' },
      { key: 'atoms', label: 'atoms' },
      { key: 'angleDeg', label: 'torsion (°)', tex: 'torsion (\\textdegree)', digits: 1 },
      { key: 'klynePrelog', label: 'Klyne–Prelog', tex: 'Klyne--Prelog' },
      { key: 'relation', label: 'relation' },
    ],
    rows,
  };
}

function puckering(records: readonly RecordAnalysis[]): Table {
  const modes = [...new Set(records.flatMap((r) => r.rings.flatMap((g) => g.puckering.amplitudes.map((a) => a.m))))].sort((a, b) => a - b);
  const rows: TableCell[][] = [];
  for (const r of records) {
    for (const g of r.rings) {
      const amp = modes.flatMap((m) => {
        const a = g.puckering.amplitudes.find((x) => x.m === m);
        return [a ? a.q : null, a ? a.phaseDeg : null];
      });
      const pr = g.pseudorotation;
      rows.push([r.record, g.id ?? null, g.size, atoms(g.atoms), g.puckering.Q, g.puckering.thetaDeg, g.puckering.phiDeg, ...amp, pr?.phaseDeg ?? null, pr?.amplitudeDeg ?? null]);
    }
  }
  return {
    kind: 'puckering',
    caption: 'Cremer–Pople puckering (Cremer and Pople 1975): total amplitude Q, θ and φ (six-rings), amplitudes q_m with phases φ_m; five-rings also pseudorotation phase P and amplitude τm (Altona and Sundaralingam 1972).',
    columns: [
      { key: 'record', label: 'record' },
      { key: 'ring', label: 'ring' },
      { key: 'size', label: 'size' },
      { key: 'atoms', label: 'atoms' },
      { key: 'Q', label: 'Q (Å)', tex: '$Q$ (\\AA)', digits: 3 },
      { key: 'thetaDeg', label: 'θ (°)', tex: '$\\theta$ (\\textdegree)', digits: 1 },
      { key: 'phiDeg', label: 'φ (°)', tex: '$\\varphi$ (\\textdegree)', digits: 1 },
      ...modes.flatMap((m) => [
        { key: `q${m}`, label: `q${m} (Å)`, tex: `$q_{${m}}$ (\\AA)`, digits: 3 },
        { key: `phi${m}Deg`, label: `φ${m} (°)`, tex: `$\\varphi_{${m}}$ (\\textdegree)`, digits: 1 },
      ]),
      { key: 'pseudorotationPDeg', label: 'P (°)', tex: '$P$ (\\textdegree)', digits: 1 },
      { key: 'tauMDeg', label: 'τm (°)', tex: '$\\tau_{m}$ (\\textdegree)', digits: 1 },
    ],
    rows,
  };
}

function shapes(records: readonly RecordAnalysis[], lowestKcal: number | null): Table {
  const rows: TableCell[][] = [];
  for (const r of records) {
    const dE = r.energy && lowestKcal !== null ? r.energy.kcal - lowestKcal : null;
    for (const g of r.rings) rows.push([r.record, r.title, g.id ?? null, atoms(g.atoms), g.shape, g.descriptor, dE]);
  }
  return {
    kind: 'shapes',
    caption: 'Ring shapes and IUPAC ring-form descriptors, with each record\'s energy relative to the lowest record.',
    columns: [
      { key: 'record', label: 'record' },
      { key: 'title', label: 'title' },
      { key: 'ring', label: 'ring' },
      { key: 'atoms', label: 'atoms' },
      { key: 'shape', label: 'shape' },
      { key: 'descriptor', label: 'descriptor' },
      { key: 'relativeEnergyKcal', label: 'ΔE (kcal/mol)', tex: '$\\Delta E$ (kcal/mol)', digits: 2 },
    ],
    rows,
  };
}

function substituents(records: readonly RecordAnalysis[]): Table {
  const rows: TableCell[][] = [];
  for (const r of records) {
    for (const g of r.rings) {
      for (const s of g.substituents) rows.push([r.record, g.id ?? null, s.ringAtom + 1, s.atom + 1, s.element, s.position, s.face, s.angleToNormalDeg]);
    }
  }
  return {
    kind: 'substituents',
    caption: 'Substituent positions on each ring, from the angle between the bond and the Cremer–Pople normal.',
    columns: [
      { key: 'record', label: 'record' },
      { key: 'ring', label: 'ring' },
      { key: 'ringAtom', label: 'ring atom' },
      { key: 'atom', label: 'atom' },
      { key: 'element', label: 'element' },
      { key: 'position', label: 'position' },
      { key: 'face', label: 'face' },
      { key: 'angleToNormalDeg', label: 'angle to normal (°)', tex: 'angle to normal (\\textdegree)', digits: 1 },
    ],
    rows,
  };
}

function couplings(records: readonly RecordAnalysis[]): Table {
  const rows: TableCell[][] = [];
  const methods = new Set<string>();
  for (const r of records) {
    for (const { ring, coupling: c } of r.couplings) {
      methods.add(c.method);
      rows.push([r.record, ring, c.front + 1, c.back + 1, c.frontCarbon + 1, c.backCarbon + 1, c.torsionDeg, c.jHz, c.method]);
    }
  }
  const names = [...methods].map((m) => COUPLING_NAMES[m] ?? m).join('; ');
  return {
    kind: 'couplings',
    caption: `Predicted vicinal ³J(H,H) for ring H–C–C–H pairs${names ? ` (${names})` : ''}; estimates from the geometry, not measurements.`,
    columns: [
      { key: 'record', label: 'record' },
      { key: 'ring', label: 'ring' },
      { key: 'front', label: 'H (front)' },
      { key: 'back', label: 'H (back)' },
      { key: 'frontCarbon', label: 'C (front)' },
      { key: 'backCarbon', label: 'C (back)' },
      { key: 'torsionDeg', label: 'H–C–C–H (°)', tex: 'H--C--C--H (\\textdegree)', digits: 1 },
      { key: 'jHz', label: '³J(H,H) (Hz)', tex: '$^{3}J_{\\mathrm{HH}}$ (Hz)', digits: 1 },
      { key: 'method', label: 'method' },
    ],
    rows,
  };
}

/**
 * The five tables of a batch, in a fixed order: torsions, puckering, shapes, substituents, couplings.
 * @example supportTables(records).map((t) => t.kind)
 */
export function supportTables(records: readonly RecordAnalysis[]): Table[] {
  const energies = records.flatMap((r) => (r.energy ? [r.energy.kcal] : []));
  const lowest = energies.length > 0 ? energies.reduce((m, e) => Math.min(m, e), Infinity) : null;
  return [torsions(records), puckering(records), shapes(records, lowest), substituents(records), couplings(records)];
}
