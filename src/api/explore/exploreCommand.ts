/** The exact `conformark` command line that writes the same figure the explorer page shows. */

/**
 * A word quoted for a POSIX shell: left bare when it holds only safe characters, else in single quotes
 * (a single quote inside becomes `'\''`). Common practice, no source.
 * @example shellWord("my file.sdf") // "'my file.sdf'"
 */
export function shellWord(word: string): string {
  if (word !== '' && /^[A-Za-z0-9_@%+=:,./-]+$/.test(word)) return word;
  return `'${word.replaceAll("'", "'\\''")}'`;
}

/** What a figure command needs: the input as the user named it, the record (from 1) and the figure's own flags. */
export interface FigureCommand {
  readonly file: string;
  readonly record: number;
  readonly kind: 'newman' | 'chair';
  /** `--bond F-B` or `--ring K`, 1-based, as the figure was made. */
  readonly flags: readonly string[];
  /** Output file name written by the command (also the page's download name). */
  readonly output: string;
}

/**
 * The command line of a figure, every word shell-quoted.
 * @example figureCommand({ file: 'c.sdf', record: 2, kind: 'newman', flags: ['--bond', '1-2'], output: 'n.svg' })
 * // "conformark newman c.sdf --record 2 --bond 1-2 -o n.svg"
 */
export function figureCommand(c: FigureCommand): string {
  return ['conformark', c.kind, c.file, '--record', String(c.record), ...c.flags, '-o', c.output].map(shellWord).join(' ');
}
