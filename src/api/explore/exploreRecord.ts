/**
 * Everything the explorer page shows for one record: for each bond a Newman figure both ways round with its
 * torsion table and ³J, for each ring its chair (or projected) figure with shape, Q/θ/φ and substituents. The
 * figures are the exact bytes `conformark newman|chair … -o FILE.svg` writes, and each carries that command.
 * Atoms are 1-based in everything this returns.
 */
import { ConformarkError } from '../../model/errors.js';
import { analyzeRing, type RingAnalysis } from '../../analysis/ringAnalysis.js';
import { figureBonds } from '../../analysis/figureBonds.js';
import { chemicalNumbering } from '../../analysis/chemicalNumbering.js';
import { couplingsAcrossBond, isSkippedCoupling, type Coupling } from '../../analysis/coupling.js';
import { newmanFigure } from '../figures/newman.js';
import { chairFigure } from '../figures/chair.js';
import type { PreparedRecord } from '../prepare.js';
import { figureCommand } from './exploreCommand.js';
import { descriptorText } from './descriptorText.js';

/** One torsion X–front–back–Y across a bond. */
export interface ExploreTorsion {
  /** X, front, back, Y (1-based). */
  readonly atoms: readonly [number, number, number, number];
  /** The four atoms' names joined by dashes, e.g. `O5–C1–C2–O2`. */
  readonly label: string;
  readonly angleDeg: number | null;
  readonly klynePrelog: string | null;
  readonly relation: string | null;
  /** Predicted ³J(H,H), Hz, for an H/H pair (Haasnoot–de Leeuw–Altona 1980 by default); else `null`. */
  readonly jHz: number | null;
  /** Both ends are heavy atoms (the pairs a hover shows). */
  readonly heavy: boolean;
}

/** One way of looking along a bond: the figure file, its bytes and the command that writes it. */
export interface ExploreFigure {
  readonly svg: string;
  readonly command: string;
  readonly file: string;
}

/** A bond the page can draw, with both viewing directions. */
export interface ExploreBond {
  /** `a-b`, 1-based, lower atom first: the same bond in every record. */
  readonly key: string;
  readonly name: string;
  /** Views: [0] front = first atom of `atoms`, [1] the other way round. Empty when the figure failed. */
  readonly views: readonly (ExploreFigure & { readonly front: number; readonly back: number })[];
  readonly conformation: string | null;
  readonly torsions: readonly ExploreTorsion[];
  readonly error: string | null;
}

/** A ring with its shape and figure. */
export interface ExploreRing {
  /** Its atoms (1-based) sorted and joined by `-`: the same ring in every record. */
  readonly key: string;
  /** Its number as `inspect` lists it, from 1. */
  readonly number: number;
  readonly name: string;
  /** Ring atoms in reference order, 1-based. */
  readonly atoms: readonly number[];
  readonly shape: string;
  readonly descriptor: string | null;
  /** The descriptor with Unicode super- and subscripts (`⁴C₁`), for display. */
  readonly descriptorText: string | null;
  readonly Q: number;
  readonly thetaDeg: number | null;
  readonly phiDeg: number | null;
  readonly substituents: readonly { readonly ringAtom: string; readonly atom: string; readonly position: string | null; readonly face: string | null; readonly angleToNormalDeg: number }[];
  readonly figure: (ExploreFigure & { readonly view: string }) | null;
  readonly error: string | null;
}

/** Options of {@link exploreRecord}. */
export interface ExploreRecordOptions {
  /** The input file as the user named it (it goes into the commands). */
  readonly file: string;
  /** Record number in the file, from 1. */
  readonly record: number;
  /** Figure options for every figure, as the CLI flags of the same names (each added to the commands when given). */
  readonly figures?: ExploreFigureOptions;
}

/** Figure options the page's figures share (the CLI's `--theme`, `--angles`, `--hydrogens` of `newman`). */
export interface ExploreFigureOptions {
  /** Built-in theme name or theme file path, for Newman and ring figures. Default `column`. */
  readonly theme?: string;
  /** Newman bond angles: `true` (measured azimuths) or `ideal` (120° spacing). Default `true`. */
  readonly angles?: 'true' | 'ideal';
  /** Newman hydrogens: `show`, `hide` or `collapse`. Default `show`. */
  readonly hydrogens?: 'show' | 'hide' | 'collapse';
}

/** The flags that give a command the same figure options. */
function figureFlags(f: ExploreFigureOptions | undefined, kind: 'newman' | 'chair'): string[] {
  return [
    ...(f?.theme === undefined ? [] : ['--theme', f.theme]),
    ...(kind === 'newman' && f?.angles !== undefined ? ['--angles', f.angles] : []),
    ...(kind === 'newman' && f?.hydrogens !== undefined ? ['--hydrogens', f.hydrogens] : []),
  ];
}

/** What {@link exploreRecord} returns. */
export interface ExploreRecordDetail {
  readonly bonds: readonly ExploreBond[];
  readonly rings: readonly ExploreRing[];
}

const round = (x: number | null, digits: number): number | null => (x === null || !Number.isFinite(x) ? null : Number(x.toFixed(digits)));

/**
 * Bonds and rings of one prepared record, with figures and the commands that make them.
 * @example exploreRecord(prepareRecord(mol), { file: 'w3.sdf', record: 1 }).bonds[0]?.views[0]?.command
 */
export function exploreRecord(prepared: PreparedRecord, options: ExploreRecordOptions): ExploreRecordDetail {
  const { molecule: mol, graph, rings } = prepared;
  const { names } = chemicalNumbering(mol, graph, rings);
  // chemical numbering where there is one, else the file's atom name, else element and number
  const name = (i: number) => names.get(i) ?? mol.atoms[i]!.name ?? `${mol.atoms[i]!.element}${i + 1}`;
  const analysed = rings.map((ring, k) => analyzeRing(mol, graph, ring, { id: k + 1 }));
  const pairs = figureBonds(mol, graph, analysed.map((r) => r.atoms), 'all');
  const bonds = pairs.map(([a, b]) => exploreBond(prepared, options, a, b, name));
  const ringItems = rings.map((ring, k) => exploreRing(prepared, options, k, name));
  return { bonds, rings: ringItems };
}

function exploreBond(prepared: PreparedRecord, options: ExploreRecordOptions, a: number, b: number, name: (i: number) => string): ExploreBond {
  const { molecule: mol, graph, rings } = prepared;
  const key = a < b ? `${a + 1}-${b + 1}` : `${b + 1}-${a + 1}`;
  const bondName = `${name(a)}–${name(b)}`;
  try {
    const views = ([[a, b], [b, a]] as const).map(([front, back]) => {
      // the same call, with the same defaults, as `conformark newman FILE --record N --bond F-B -o FILE.svg`
      const figure = newmanFigure(mol, { bond: [front, back], graph, rings, theme: options.figures?.theme, angles: options.figures?.angles, hydrogens: options.figures?.hydrogens });
      const file = `newman-r${options.record}-${front + 1}-${back + 1}.svg`;
      const command = figureCommand({ file: options.file, record: options.record, kind: 'newman', flags: ['--bond', `${front + 1}-${back + 1}`, ...figureFlags(options.figures, 'newman')], output: file });
      return { front: front + 1, back: back + 1, svg: svgBytes(figure.svg), command, file, view: figure.view };
    });
    const view = views[0]!.view;
    const couplings = new Map(
      couplingsAcrossBond(mol, graph, a, b, {})
        .filter((c): c is Coupling => !isSkippedCoupling(c))
        .map((c) => [`${c.front}-${c.back}`, c.jHz]),
    );
    const heavy = (i: number) => mol.atoms[i]!.element !== 'H';
    const torsions = view.pairs.map((p): ExploreTorsion => ({
      atoms: [p.front + 1, a + 1, b + 1, p.back + 1],
      label: [p.front, a, b, p.back].map(name).join('–'),
      angleDeg: round(p.torsionDeg, 2),
      klynePrelog: p.klynePrelog,
      relation: p.relation,
      jHz: round(couplings.get(`${p.front}-${p.back}`) ?? null, 2),
      heavy: heavy(p.front) && heavy(p.back),
    }));
    return { key, name: bondName, views: views.map(({ view: _view, ...rest }) => rest), conformation: view.conformation, torsions, error: null };
  } catch (err) {
    return { key, name: bondName, views: [], conformation: null, torsions: [], error: userMessage(err) };
  }
}

function exploreRing(prepared: PreparedRecord, options: ExploreRecordOptions, k: number, name: (i: number) => string): ExploreRing {
  const { molecule: mol, graph, rings } = prepared;
  const atoms = rings[k]!;
  let ring: RingAnalysis;
  let figure: ExploreRing['figure'] = null;
  let error: string | null = null;
  try {
    // the same call as `conformark chair FILE --record N --ring K -o FILE.svg` (its defaults spelled out as the CLI does)
    const drawn = chairFigure(mol, { graph, rings, ring: k + 1, ordered: false, hydrogens: 'stereo', labels: 'element', caption: true, theme: options.figures?.theme });
    ring = drawn.ring;
    const file = `chair-r${options.record}-ring${k + 1}.svg`;
    const command = figureCommand({ file: options.file, record: options.record, kind: 'chair', flags: ['--ring', String(k + 1), ...figureFlags(options.figures, 'chair')], output: file });
    figure = { svg: svgBytes(drawn.svg), command, file, view: drawn.view };
  } catch (err) {
    error = userMessage(err);
    ring = analyzeRing(mol, graph, atoms, { id: k + 1 });
  }
  return {
    key: [...atoms].map((i) => i + 1).sort((x, y) => x - y).join('-'),
    number: k + 1,
    name: ring.atoms.map(name).join('–'),
    atoms: ring.atoms.map((i) => i + 1),
    shape: ring.shape,
    descriptor: ring.descriptor,
    descriptorText: ring.descriptor === null ? null : descriptorText(ring.descriptor),
    Q: round(ring.puckering.Q, 3) ?? 0,
    thetaDeg: round(ring.puckering.thetaDeg, 1),
    phiDeg: round(ring.puckering.phiDeg, 1),
    substituents: ring.substituents.map((s) => ({ ringAtom: name(s.ringAtom), atom: name(s.atom), position: s.position, face: s.face, angleToNormalDeg: round(s.angleToNormalDeg, 1) ?? 0 })),
    figure,
    error,
  };
}

/** The bytes `-o FILE.svg` writes: `figureBytes(svg, 'svg')` is the text with one final newline. */
function svgBytes(svg: string): string {
  return svg.endsWith('\n') ? svg : `${svg}\n`;
}

/** A user error's message; a bug is not swallowed. */
function userMessage(err: unknown): string {
  if (err instanceof ConformarkError) return err.issues.map((i) => i.message).join('; ');
  throw err;
}
