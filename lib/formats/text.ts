/**
 * Plain-text plumbing shared by the readers: size and binary checks, lines, numbers with their
 * line numbers. Every refusal is a PhotometryFileError naming the line.
 */
import { PhotometryFileError } from './errors';

/** Largest photometric file read, characters (2 MB: a 1° × 1° full-sphere grid is about 0.5 MB). */
export const MAX_PHOTOMETRY_FILE_CHARS = 2_000_000;

/** Above this share of U+FFFD (undecodable bytes) the text is taken to be binary. */
const MAX_REPLACEMENT_SHARE = 0.05;

/** A strict decimal number: digits, one optional point, optional exponent. No hex, no `Infinity`. */
const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Split text into lines (LF, CRLF or CR) after checking it is text of a sane size. Throws for
 * files over MAX_PHOTOMETRY_FILE_CHARS, NUL or other control characters, and undecodable junk.
 */
export function checkedLines(text: string, fileName: string): string[] {
  if (typeof text !== 'string') throw new PhotometryFileError(fileName, null, 'is not text');
  if (text.length > MAX_PHOTOMETRY_FILE_CHARS) {
    throw new PhotometryFileError(
      fileName,
      null,
      `is ${(text.length / 1e6).toFixed(1)} MB; photometric files are limited to ${MAX_PHOTOMETRY_FILE_CHARS / 1e6} MB`,
    );
  }
  if (text.trim() === '') throw new PhotometryFileError(fileName, 1, 'the file is empty');
  const lines = text.split(/\r\n|\n|\r/);
  let replacements = 0;
  for (let index = 0; index < lines.length; index += 1) {
    const line = lines[index];
    for (let position = 0; position < line.length; position += 1) {
      const code = line.charCodeAt(position);
      // Tab, vertical tab, form feed and the DOS end-of-file mark (0x1A) are harmless in text files.
      if (code < 32 && code !== 9 && code !== 11 && code !== 12 && code !== 26) {
        throw new PhotometryFileError(
          fileName,
          index + 1,
          `holds a control character (code ${code}): this is a binary file, not a photometric text file`,
        );
      }
      if (code === 0xfffd) replacements += 1;
    }
  }
  if (replacements > MAX_REPLACEMENT_SHARE * text.length) {
    throw new PhotometryFileError(fileName, null, 'is mostly undecodable bytes: this is not a text file');
  }
  return lines;
}

/** A number from one token, or null if the token is not a plain decimal number. */
export function parseNumber(token: string): number | null {
  if (!NUMBER_PATTERN.test(token)) return null;
  const value = Number(token);
  return Number.isFinite(value) ? value : null;
}

export interface Token {
  readonly text: string;
  /** 1-based line number. */
  readonly line: number;
}

/** Tokens separated by spaces, tabs or commas on lines [fromIndex, end), each with its line number. */
export function tokensFrom(lines: readonly string[], fromIndex: number): Token[] {
  const tokens: Token[] = [];
  for (let index = fromIndex; index < lines.length; index += 1) {
    for (const text of lines[index].split(/[\s,;]+/)) {
      if (text !== '' && text !== '\u001a') tokens.push({ text, line: index + 1 });
    }
  }
  return tokens;
}

/** Reads numbers from a token list in order, refusing non-numbers and a short file with the line. */
export class NumberCursor {
  private index = 0;

  constructor(
    private readonly tokens: readonly Token[],
    private readonly fileName: string,
    private readonly lastLine: number,
  ) {}

  /** How many tokens are left. */
  remaining(): number {
    return this.tokens.length - this.index;
  }

  /** The line of the next token (or the last line when none is left). */
  line(): number {
    return this.tokens[this.index]?.line ?? this.lastLine;
  }

  /** The next number; `what` names it in the message when it is missing or not a number. */
  next(what: string): number {
    const token = this.tokens[this.index];
    if (token === undefined) {
      throw new PhotometryFileError(this.fileName, this.lastLine, `the file ends before ${what}`);
    }
    const value = parseNumber(token.text);
    if (value === null) {
      throw new PhotometryFileError(
        this.fileName,
        token.line,
        `expected a number for ${what}, found "${clip(token.text)}"`,
      );
    }
    this.index += 1;
    return value;
  }

  /** The tokens not read yet. */
  rest(): readonly Token[] {
    return this.tokens.slice(this.index);
  }
}

/** A token or line shortened for a message. */
export function clip(text: string, length = 24): string {
  return text.length > length ? `${text.slice(0, length)}…` : text;
}
