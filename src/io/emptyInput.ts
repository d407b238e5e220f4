/** The issue for an input that yields no record at all. */
import type { Issue } from '../model/errors.js';
import { issue } from './sink.js';

/** `blank`: the input has no non-blank character. */
export function emptyInputIssue(file: string, blank: boolean): Issue {
  return blank
    ? issue('empty-file', file, null, 'the file is empty')
    : issue('no-records', file, null, 'no records found (no atoms in the file)');
}
