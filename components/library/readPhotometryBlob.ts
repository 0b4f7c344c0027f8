/** Reading a dropped or chosen file as text: UTF-8 when it is valid UTF-8, else Windows-1252 (older files). */
import { MAX_PHOTOMETRY_FILE_CHARS, type PhotometryDistribution, readPhotometryFile } from '@/lib/formats';

export type ImportOutcome =
  | { readonly ok: true; readonly distribution: PhotometryDistribution }
  | { readonly ok: false; readonly message: string };

/** Decode bytes: strict UTF-8 first, then Windows-1252, so binary junk shows up as control characters. */
export function decodePhotometryBytes(bytes: ArrayBuffer): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return new TextDecoder('windows-1252').decode(bytes);
  }
}

/** Read a file and parse it; every failure becomes a message naming the file and line. */
export async function importPhotometryFile(file: Blob & { readonly name: string }): Promise<ImportOutcome> {
  if (file.size > MAX_PHOTOMETRY_FILE_CHARS * 4) {
    return {
      ok: false,
      message: `${file.name}: is ${(file.size / 1e6).toFixed(1)} MB; photometric files are limited to ${MAX_PHOTOMETRY_FILE_CHARS / 1e6} MB`,
    };
  }
  try {
    const text = decodePhotometryBytes(await file.arrayBuffer());
    return { ok: true, distribution: readPhotometryFile(text, file.name) };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : `${file.name}: could not be read` };
  }
}

/** True when a file name looks like a photometric file (.ies or .ldt). */
export function isPhotometryFileName(name: string): boolean {
  return /\.(ies|ldt)$/i.test(name);
}
