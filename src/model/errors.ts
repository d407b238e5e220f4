/** Structured problems and the error types that carry them. */

/** One problem found in user input. `line` is 1-based; `null` when no line applies. */
export interface Issue {
  /** Stable kebab-case code, e.g. `wrong-count`, `bad-number`, `unknown-element`. */
  readonly code: string;
  readonly file: string;
  readonly line: number | null;
  readonly message: string;
}

/** Formats an issue as the one line the CLI prints: `file:12: message`. */
export function formatIssue(issue: Issue): string {
  const where = issue.line === null ? issue.file : `${issue.file}:${issue.line}`;
  return where ? `${where}: ${issue.message}` : issue.message;
}

/**
 * A user-facing failure (bad input, bad selection, bad option). The CLI prints each issue as one line and
 * exits 2; it never prints a stack for these.
 */
export class ConformarkError extends Error {
  readonly issues: readonly Issue[];
  constructor(issues: Issue | readonly Issue[]) {
    const list = Array.isArray(issues) ? (issues as readonly Issue[]) : [issues as Issue];
    super(list.map(formatIssue).join('\n'));
    this.name = 'ConformarkError';
    this.issues = list;
  }
  /** The code of the first issue. */
  get code(): string {
    return this.issues[0]?.code ?? 'error';
  }
}

/** A file could not be parsed; holds every issue found. */
export class ParseError extends ConformarkError {
  constructor(issues: Issue | readonly Issue[]) {
    super(issues);
    this.name = 'ParseError';
  }
}

/** Shorthand for a single-issue user error with no file position (bad option, bad selection). */
export function usageError(code: string, message: string, file = ''): ConformarkError {
  return new ConformarkError({ code, file, line: null, message });
}

/** Suspicious but valid input: reported, never fatal. */
export interface Warning {
  readonly code: string;
  readonly message: string;
}
