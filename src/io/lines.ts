/**
 * Bytes or text → lines, for every reader. Decodes UTF-8 strictly (invalid bytes or NUL characters are one
 * clear "not a text file" error), strips CR of CRLF, counts lines from 1, and refuses over-long lines before
 * they are held in memory in full.
 */
import { ParseError } from '../model/errors.js';
import { issue } from './sink.js';

/**
 * Pushes text or bytes in, returns the complete lines (without line breaks); `end()` returns the last one.
 * Lines are numbered consecutively from 1: the first line returned by a push is `lastLine + 1` of before.
 */
export class LineSplitter {
  private readonly decoder = new TextDecoder('utf-8', { fatal: true });
  private rest = '';
  private lineNo = 0;

  constructor(
    private readonly file: string,
    private readonly maxLineLength: number,
  ) {}

  /** Number of the last line handed out (0 before the first). */
  get lastLine(): number {
    return this.lineNo;
  }

  /** Pushes raw bytes. Throws `ParseError` on binary input or an over-long line. */
  pushBytes(bytes: Uint8Array): string[] {
    let text: string;
    try {
      text = this.decoder.decode(bytes, { stream: true });
    } catch {
      throw this.notText();
    }
    return this.pushText(text);
  }

  /** Pushes decoded text. Throws `ParseError` on NUL characters or an over-long line. */
  pushText(text: string): string[] {
    if (text.indexOf('\u0000') !== -1) throw this.notText();
    const out: string[] = [];
    let pos = 0;
    let nl = text.indexOf('\n');
    if (this.rest !== '' && nl !== -1) {
      out.push(this.finish(this.rest + text.slice(0, nl)));
      this.rest = '';
      pos = nl + 1;
      nl = text.indexOf('\n', pos);
    }
    const max = this.maxLineLength;
    while (nl !== -1) {
      let stop = nl;
      if (stop > pos && text.charCodeAt(stop - 1) === 13) stop--;
      if (stop - pos > max) this.tooLong(this.lineNo + 1);
      out.push(text.slice(pos, stop));
      this.lineNo++;
      pos = nl + 1;
      nl = text.indexOf('\n', pos);
    }
    if (pos < text.length) {
      this.rest = this.rest + text.slice(pos);
      if (this.rest.length > max + 1) this.tooLong(this.lineNo + 1);
    }
    return out;
  }

  /** Flushes the last line (when the input does not end with a line break). */
  end(): string[] {
    let out: string[];
    try {
      out = this.pushText(this.decoder.decode());
    } catch (err) {
      if (err instanceof ParseError) throw err;
      throw this.notText();
    }
    if (this.rest !== '') {
      out.push(this.finish(this.rest));
      this.rest = '';
    }
    return out;
  }

  private finish(raw: string): string {
    const line = raw.charCodeAt(raw.length - 1) === 13 ? raw.slice(0, -1) : raw;
    if (line.length > this.maxLineLength) this.tooLong(this.lineNo + 1);
    this.lineNo++;
    return line;
  }

  private tooLong(lineNo: number): never {
    throw new ParseError(
      issue('line-too-long', this.file, lineNo, `line is longer than ${this.maxLineLength} characters`),
    );
  }

  private notText(): ParseError {
    return new ParseError(
      issue(
        'binary-input',
        this.file,
        this.lineNo + 1,
        'this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text',
      ),
    );
  }
}
