/**
 * Reading a plot file: text → JSON → format and version check → migrations → schema and reference
 * checks. Never throws and never returns a half-valid document: either the document, or every
 * problem with its path.
 */
import { PLOT_FORMAT, PLOT_VERSION, type PlotDocument, plotDocument } from './schema/document';
import { describeIssues } from './issues';
import { type JsonObject, migrateToCurrent } from './migrations';

export type LoadResult =
  { ok: true; document: PlotDocument; migrations: string[] } | { ok: false; errors: string[] };

/** Largest plot file accepted, bytes (10 MB). */
export const MAX_PLOT_FILE_BYTES = 10 * 1024 * 1024;

/** Parse and validate the text of a plot file. */
export function loadPlotText(text: string): LoadResult {
  if (typeof text !== 'string') return { ok: false, errors: ['(the file): is not text'] };
  if (text.length > MAX_PLOT_FILE_BYTES) {
    return {
      ok: false,
      errors: [`(the file): is ${(text.length / 1e6).toFixed(1)} MB; plot files are limited to 10 MB`],
    };
  }
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch (error) {
    return { ok: false, errors: [`(the file): is not valid JSON (${(error as Error).message})`] };
  }
  return loadPlotValue(parsed);
}

/** Validate an already-parsed value as a plot file (e.g. a request body). */
export function loadPlotValue(value: unknown): LoadResult {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return { ok: false, errors: ['(the file): must be a JSON object with "format": "throwline-plot"'] };
  }
  const file = value as JsonObject;
  if (file.format !== PLOT_FORMAT) {
    const found = file.format === undefined ? 'no format field' : `format ${JSON.stringify(file.format)}`;
    return {
      ok: false,
      errors: [`format: this is not a Throwline plot file (${found}; expected "${PLOT_FORMAT}")`],
    };
  }
  const version = file.version ?? 0;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return { ok: false, errors: ['version: must be a whole number'] };
  }
  if (version > PLOT_VERSION) {
    return {
      ok: false,
      errors: [
        `version: the file is version ${version}, made by a newer Throwline; this one reads versions up to ${PLOT_VERSION}`,
      ],
    };
  }
  const migrated = migrateToCurrent(file, version);
  if (!migrated.ok) return { ok: false, errors: [migrated.message] };
  const result = plotDocument.safeParse(migrated.file);
  if (!result.success) return { ok: false, errors: describeIssues(result.error.issues) };
  return { ok: true, document: result.data, migrations: migrated.applied };
}

/** The text of a plot file for a document (stable key order, two-space indent). */
export function savePlotText(document: PlotDocument): string {
  return `${JSON.stringify(document, null, 2)}\n`;
}
