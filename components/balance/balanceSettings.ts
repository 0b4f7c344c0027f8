/** What the user asks the balance panel for, and how it becomes the solver's choice. */
import type { BalanceChoice, BalanceKeyTarget, PlotDocument } from '@/lib/plot';
import { keyOverFillFromLightingRatio, keyOverFillFromStops, parseRatioText } from '@/lib/units';

export type RatioMode = 'lighting' | 'stops' | 'none';

export interface BalanceSettings {
  readonly subjectIds: readonly string[];
  readonly key: BalanceKeyTarget;
  /** 'lighting': the photographers' (key + fill) : fill as text ("2:1"); 'stops': key alone over fill alone. */
  readonly ratioMode: RatioMode;
  readonly lightingRatioText: string;
  readonly keyFillStops: number;
  readonly backOn: boolean;
  readonly backStops: number;
  /** Units that may change; null: the suggested ones (key, fill and back units of the chosen subjects). */
  readonly mayChange: readonly string[] | null;
}

/** Start with the selected subject (or the first), the main camera's exposure and a 2:1 lighting ratio. */
export function initialBalanceSettings(
  document: PlotDocument,
  selection: readonly string[],
): BalanceSettings {
  const selected = document.subjects.filter((person) => selection.includes(person.id)).map((p) => p.id);
  const main = document.viewpoints.find((view) => view.id === document.mainViewpointId);
  const camera = main?.camera ? main : document.viewpoints.find((view) => view.camera);
  return {
    subjectIds: selected.length > 0 ? selected : document.subjects.slice(0, 1).map((person) => person.id),
    key: camera ? { kind: 'camera', viewpointId: camera.id } : { kind: 'lux', lx: 500 },
    ratioMode: 'lighting',
    lightingRatioText: '2:1',
    keyFillStops: 1,
    backOn: false,
    backStops: 0,
    mayChange: null,
  };
}

/** Why the key:fill asked for cannot be used (key ≥ fill by definition); null when it can. */
export function ratioProblem(settings: BalanceSettings): string | null {
  if (settings.ratioMode === 'stops')
    return keyOverFillFromStops(settings.keyFillStops) === null
      ? 'Key over fill must be 0 stops or more: the key is the brighter side by definition (0 stops is key = fill).'
      : null;
  if (settings.ratioMode !== 'lighting') return null;
  const ratio = parseRatioText(settings.lightingRatioText);
  if (ratio === null) return 'Give the lighting ratio as N:1 with N of 2 or more, e.g. 2:1 (key = fill).';
  return keyOverFillFromLightingRatio(ratio) === null
    ? 'The lighting ratio must be 2:1 or more: the key is the brighter side by definition, and 2:1 is key = fill.'
    : null;
}

/** Key alone over fill alone for the settings; undefined when it cannot be used (see ratioProblem). */
export function keyOverFillOf(settings: BalanceSettings): number | null | undefined {
  if (settings.ratioMode === 'none') return null;
  if (settings.ratioMode === 'stops') return keyOverFillFromStops(settings.keyFillStops) ?? undefined;
  const ratio = parseRatioText(settings.lightingRatioText);
  return ratio === null ? undefined : (keyOverFillFromLightingRatio(ratio) ?? undefined);
}

export function choiceOf(
  settings: BalanceSettings,
  mayChange: readonly string[],
): BalanceChoice | { error: string } {
  const keyOverFill = keyOverFillOf(settings);
  if (keyOverFill === undefined)
    return { error: ratioProblem(settings) ?? 'The key:fill ratio cannot be used.' };
  return {
    subjectIds: settings.subjectIds,
    key: settings.key,
    keyOverFill,
    backOverKeyStops: settings.backOn ? settings.backStops : null,
    mayChange,
  };
}
