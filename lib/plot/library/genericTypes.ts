/**
 * The built-in library: generic fixture types with names of our own. Every figure is a typical value,
 * from memory — not any maker's data; each entry's notes say so. Profile spots are named by their
 * field angle, as the trade names lens tubes. Users copy an entry into their show and edit it there.
 */
import type { FixtureType } from '../schema/fixtureType';

export interface LibraryEntry {
  /** Stable key of the entry (never an id in a plot). */
  readonly libraryId: string;
  readonly type: Omit<FixtureType, 'id'>;
}

const TYPICAL = 'Typical values, from memory; not any maker’s data.';

type Round = { beam: number; field: number };

function beamType(options: {
  libraryId: string;
  name: string;
  category: FixtureType['category'];
  spread: Round | { x: Round; y: Round };
  output: { lumens: number } | { peakCd: number };
  zoom?: { min: number; max: number; fieldPerBeam: number };
  lenses?: number[];
  powerW: number;
  weightKg: number;
  colourTemperatureK: number;
  dimmingCurve: FixtureType['dimmingCurve'];
  note?: string;
}): LibraryEntry {
  const spread =
    'x' in options.spread
      ? {
          kind: 'oval' as const,
          beamAngleXDeg: options.spread.x.beam,
          fieldAngleXDeg: options.spread.x.field,
          beamAngleYDeg: options.spread.y.beam,
          fieldAngleYDeg: options.spread.y.field,
          rotationDeg: 0,
        }
      : { kind: 'round' as const, beamAngleDeg: options.spread.beam, fieldAngleDeg: options.spread.field };
  return {
    libraryId: options.libraryId,
    type: {
      name: options.name,
      category: options.category,
      photometry: {
        kind: 'beam',
        output:
          'lumens' in options.output
            ? { kind: 'lumens', lumens: options.output.lumens }
            : { kind: 'peak', peakCd: options.output.peakCd },
        spread,
        zoom: options.zoom
          ? {
              minBeamDeg: options.zoom.min,
              maxBeamDeg: options.zoom.max,
              fieldPerBeam: options.zoom.fieldPerBeam,
            }
          : null,
        lensOptionsDeg: options.lenses ?? [],
      },
      powerW: options.powerW,
      weightKg: options.weightKg,
      colourTemperatureK: options.colourTemperatureK,
      dimmingCurve: options.dimmingCurve,
      notes: options.note ? `${options.note} ${TYPICAL}` : TYPICAL,
    },
  };
}

function softType(options: {
  libraryId: string;
  name: string;
  shape: { widthM: number; heightM: number } | { radiusM: number };
  lumens: number;
  powerW: number;
  weightKg: number;
  colourTemperatureK: number;
}): LibraryEntry {
  return {
    libraryId: options.libraryId,
    type: {
      name: options.name,
      category: 'soft',
      photometry: {
        kind: 'soft',
        shape:
          'radiusM' in options.shape
            ? { kind: 'disc', radiusM: options.shape.radiusM }
            : { kind: 'rectangle', widthM: options.shape.widthM, heightM: options.shape.heightM },
        output: { kind: 'lumens', lumens: options.lumens },
      },
      powerW: options.powerW,
      weightKg: options.weightKg,
      colourTemperatureK: options.colourTemperatureK,
      dimmingCurve: 'linear',
      notes: TYPICAL,
    },
  };
}

const tungsten = { colourTemperatureK: 3200, dimmingCurve: 'incandescent' as const };
const led = { colourTemperatureK: 5600, dimmingCurve: 'linear' as const };
const profileLenses = [19, 26, 36, 50];

/** Every built-in generic type, grouped by category in display order. */
export const LIBRARY: readonly LibraryEntry[] = [
  ...[
    { field: 19, beam: 14, lumens: 7000 },
    { field: 26, beam: 19, lumens: 7800 },
    { field: 36, beam: 26, lumens: 8300 },
    { field: 50, beam: 36, lumens: 8000 },
  ].map((lens) =>
    beamType({
      libraryId: `profile-${lens.field}`,
      name: `Profile ${lens.field}° (750 W tungsten)`,
      category: 'profile',
      spread: { beam: lens.beam, field: lens.field },
      output: { lumens: lens.lumens },
      lenses: profileLenses.map((field) => Math.round(field * 0.72)),
      powerW: 750,
      weightKg: 8,
      ...tungsten,
      note: 'Named by field angle; lens options are beam angles of the other tubes.',
    }),
  ),
  beamType({
    libraryId: 'profile-zoom-15-30',
    name: 'Zoom profile 15°–30° (LED)',
    category: 'profile',
    spread: { beam: 22, field: 30 },
    output: { lumens: 9000 },
    zoom: { min: 11, max: 22, fieldPerBeam: 1.36 },
    powerW: 300,
    weightKg: 12,
    ...led,
  }),
  beamType({
    libraryId: 'profile-zoom-25-50',
    name: 'Zoom profile 25°–50° (750 W tungsten)',
    category: 'profile',
    spread: { beam: 36, field: 50 },
    output: { lumens: 8000 },
    zoom: { min: 18, max: 36, fieldPerBeam: 1.39 },
    powerW: 750,
    weightKg: 9,
    ...tungsten,
  }),
  beamType({
    libraryId: 'fresnel-650',
    name: 'Fresnel 650 W, spot–flood',
    category: 'fresnel',
    spread: { beam: 60, field: 90 },
    output: { lumens: 4500 },
    zoom: { min: 12, max: 60, fieldPerBeam: 1.5 },
    powerW: 650,
    weightKg: 3.5,
    ...tungsten,
  }),
  beamType({
    libraryId: 'fresnel-1k',
    name: 'Fresnel 1 kW, spot–flood',
    category: 'fresnel',
    spread: { beam: 60, field: 90 },
    output: { lumens: 8000 },
    zoom: { min: 8, max: 60, fieldPerBeam: 1.5 },
    powerW: 1000,
    weightKg: 6.5,
    ...tungsten,
  }),
  beamType({
    libraryId: 'fresnel-2k',
    name: 'Fresnel 2 kW, spot–flood',
    category: 'fresnel',
    spread: { beam: 55, field: 82 },
    output: { lumens: 17000 },
    zoom: { min: 10, max: 55, fieldPerBeam: 1.5 },
    powerW: 2000,
    weightKg: 11,
    ...tungsten,
  }),
  beamType({
    libraryId: 'fresnel-led-150',
    name: 'LED Fresnel 150 W, spot–flood',
    category: 'fresnel',
    spread: { beam: 60, field: 88 },
    output: { lumens: 6000 },
    zoom: { min: 15, max: 60, fieldPerBeam: 1.45 },
    powerW: 150,
    weightKg: 7,
    ...led,
  }),
  ...[
    { id: 'very-narrow', label: 'very narrow', x: [9, 16], y: [12, 22], peakCd: 400000 },
    { id: 'narrow', label: 'narrow', x: [10, 18], y: [14, 26], peakCd: 330000 },
    { id: 'medium', label: 'medium', x: [11, 21], y: [24, 42], peakCd: 125000 },
    { id: 'wide', label: 'wide flood', x: [25, 45], y: [55, 95], peakCd: 40000 },
  ].map((lamp) =>
    beamType({
      libraryId: `par-1k-${lamp.id}`,
      name: `PAR can 1 kW, ${lamp.label} (oval ${lamp.x[0]}° × ${lamp.y[0]}°)`,
      category: 'par',
      spread: { x: { beam: lamp.x[0], field: lamp.x[1] }, y: { beam: lamp.y[0], field: lamp.y[1] } },
      output: { peakCd: lamp.peakCd },
      powerW: 1000,
      weightKg: 3,
      ...tungsten,
      note: 'Oval beam: turn the lamp to set the rotation.',
    }),
  ),
  beamType({
    libraryId: 'wash-led-zoom-7-50',
    name: 'LED wash, zoom 7°–50°',
    category: 'wash',
    spread: { beam: 50, field: 80 },
    output: { lumens: 12000 },
    zoom: { min: 7, max: 50, fieldPerBeam: 1.6 },
    powerW: 600,
    weightKg: 22,
    ...led,
  }),
  beamType({
    libraryId: 'wash-led-zoom-15-45',
    name: 'LED wash, compact, zoom 15°–45°',
    category: 'wash',
    spread: { beam: 45, field: 72 },
    output: { lumens: 5000 },
    zoom: { min: 15, max: 45, fieldPerBeam: 1.6 },
    powerW: 250,
    weightKg: 9,
    ...led,
  }),
  beamType({
    libraryId: 'followspot-long',
    name: 'Follow spot, long throw, zoom 3°–10°',
    category: 'followspot',
    spread: { beam: 10, field: 13 },
    output: { lumens: 30000 },
    zoom: { min: 3, max: 10, fieldPerBeam: 1.3 },
    powerW: 2500,
    weightKg: 60,
    colourTemperatureK: 6000,
    dimmingCurve: 'linear',
  }),
  beamType({
    libraryId: 'followspot-short',
    name: 'Follow spot, short throw, zoom 8°–20°',
    category: 'followspot',
    spread: { beam: 20, field: 26 },
    output: { lumens: 12000 },
    zoom: { min: 8, max: 20, fieldPerBeam: 1.3 },
    powerW: 800,
    weightKg: 25,
    colourTemperatureK: 6000,
    dimmingCurve: 'linear',
  }),
  softType({
    libraryId: 'panel-1x1',
    name: 'LED panel 1×1 (30 × 30 cm)',
    shape: { widthM: 0.3, heightM: 0.3 },
    lumens: 4000,
    powerW: 60,
    weightKg: 2.5,
    colourTemperatureK: 5600,
  }),
  softType({
    libraryId: 'panel-1x2',
    name: 'LED panel 1×2 (30 × 60 cm)',
    shape: { widthM: 0.3, heightM: 0.6 },
    lumens: 8000,
    powerW: 120,
    weightKg: 4.5,
    colourTemperatureK: 5600,
  }),
  softType({
    libraryId: 'softbox-60x90',
    name: 'Soft box 60 × 90 cm',
    shape: { widthM: 0.6, heightM: 0.9 },
    lumens: 10000,
    powerW: 300,
    weightKg: 3,
    colourTemperatureK: 5600,
  }),
  softType({
    libraryId: 'softbox-90x120',
    name: 'Soft box 90 × 120 cm',
    shape: { widthM: 0.9, heightM: 1.2 },
    lumens: 16000,
    powerW: 600,
    weightKg: 5,
    colourTemperatureK: 5600,
  }),
  softType({
    libraryId: 'octa-120',
    name: 'Octagonal soft box 120 cm (as a disc)',
    shape: { radiusM: 0.6 },
    lumens: 16000,
    powerW: 600,
    weightKg: 5,
    colourTemperatureK: 5600,
  }),
];

/** The library entry with this key, or undefined. */
export function libraryEntry(libraryId: string): LibraryEntry | undefined {
  return LIBRARY.find((entry) => entry.libraryId === libraryId);
}
