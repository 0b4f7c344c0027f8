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

/** Key alone over fill alone for the settings; undefined when the ratio text cannot be read. */
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
    return { error: 'Give the lighting ratio as N:1 with N above 1, e.g. 2:1 (key = fill).' };
  return {
    subjectIds: settings.subjectIds,
    key: settings.key,
    keyOverFill,
    backOverKeyStops: settings.backOn ? settings.backStops : null,
    mayChange,
  };
}
