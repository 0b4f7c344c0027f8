/** The one error type the photometric-file readers throw: a message for people, with the line it is about. */

/** Which reader refused the file. */
export type PhotometryFormat = 'lm63' | 'eulumdat';

/**
 * A photometric file that cannot be read. `line` is the 1-based line the problem is on (null when
 * it is about the file as a whole, e.g. its size); the message names it as `name.ies, line 12: …`.
 */
export class PhotometryFileError extends Error {
  readonly line: number | null;
  readonly fileName: string;
  /** The problem without the file name and line, e.g. `expected 19 vertical angles, found 18`. */
  readonly problem: string;

  constructor(fileName: string, line: number | null, problem: string) {
    super(`${fileName}${line === null ? '' : `, line ${line}`}: ${problem}`);
    this.name = 'PhotometryFileError';
    this.line = line;
    this.fileName = fileName;
    this.problem = problem;
  }
}

/** True for the readers' own refusals (anything else thrown by a reader is a bug). */
export function isPhotometryFileError(error: unknown): error is PhotometryFileError {
  return error instanceof PhotometryFileError;
}
