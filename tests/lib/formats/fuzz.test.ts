import { describe, expect, it } from 'vitest';
import { seededRandom } from '@/lib/seededRandom';
import { PhotometryFileError, candelaGridProblems, readPhotometryFile } from '@/lib/formats';
import { fixtureType, measuredTypeDraft } from '@/lib/plot';
import { lambertian, oval, range, writeEulumdat, writeLm63 } from './synthetic';

const SEEDS: { name: string; text: string }[] = [
  {
    name: 'a.ies',
    text: writeLm63({
      vertical: range(0, 90, 10),
      horizontal: [0, 90],
      intensity: lambertian(1000),
      decimals: 1,
    }),
  },
  {
    name: 'b.ies',
    text: writeLm63({
      version: '2019',
      vertical: range(0, 180, 30),
      horizontal: range(0, 360, 90),
      intensity: oval,
      decimals: 2,
    }),
  },
  {
    name: 'c.ldt',
    text: writeEulumdat({
      isym: 4,
      cAngles: range(0, 270, 90),
      gammas: range(0, 90, 15),
      intensity: oval,
      decimals: 3,
    }),
  },
];

const PIECES = [
  '0',
  '-1',
  '9e99',
  '1e-300',
  '.',
  '-',
  ',',
  ' ',
  '\n',
  '\r',
  'TILT=',
  '[MORE]',
  'NaN',
  'Infinity',
  '\u0000',
  '\u00ff',
  '\ufffd',
  '180',
  '360',
  '2000',
  '1e6',
];

function mutate(text: string, random: () => number): string {
  let result = text;
  const steps = 1 + Math.floor(random() * 3);
  for (let step = 0; step < steps; step += 1) {
    const at = Math.floor(random() * (result.length + 1));
    const choice = Math.floor(random() * 7);
    if (choice === 0)
      result = result.slice(0, at); // truncate
    else if (choice === 1)
      result = result.slice(0, at) + result.slice(at + 1 + Math.floor(random() * 20)); // delete
    else if (choice === 2)
      result = result.slice(0, at) + PIECES[Math.floor(random() * PIECES.length)] + result.slice(at); // insert
    else if (choice === 3)
      result = result.slice(0, at) + String.fromCharCode(Math.floor(random() * 256)) + result.slice(at + 1); // byte
    else if (choice === 4) {
      const lines = result.split('\n');
      const line = Math.floor(random() * lines.length);
      lines.splice(line, 0, lines[Math.floor(random() * lines.length)]); // duplicate a line
      result = lines.join('\n');
    } else if (choice === 5) {
      const lines = result.split('\n');
      lines.splice(Math.floor(random() * lines.length), 1); // drop a line
      result = lines.join('\n');
    } else {
      result = result.replace(/-?\d+(\.\d+)?/g, (match) =>
        random() < 0.05 ? String(Math.round((random() - 0.3) * 400)) : match,
      ); // change numbers
    }
  }
  return result;
}

describe('fuzzing the readers', () => {
  it('3000 mutated files from a fixed seed: only typed errors, never NaN, never a broken grid in the document', () => {
    const random = seededRandom(20261201);
    let read = 0;
    let refused = 0;
    for (let run = 0; run < 3000; run += 1) {
      const seed = SEEDS[run % SEEDS.length];
      const text = mutate(seed.text, random);
      let distribution;
      try {
        distribution = readPhotometryFile(text, seed.name);
      } catch (error) {
        if (!(error instanceof PhotometryFileError)) throw new Error(`run ${run}: ${String(error)}\n${text}`);
        expect(error.message.length).toBeGreaterThan(0);
        refused += 1;
        continue;
      }
      read += 1;
      const figures = [
        distribution.totalLumens,
        distribution.peakCd,
        distribution.beamAngleDeg,
        distribution.fieldAngleDeg,
        distribution.intensityCd(33, 77),
      ];
      if (!figures.every(Number.isFinite))
        throw new Error(`run ${run}: figures ${figures.join(', ')}\n${text}`);
      expect(candelaGridProblems(distribution.grid)).toEqual([]);
      const parsed = fixtureType.safeParse({ ...measuredTypeDraft(distribution), id: 'type-1' });
      if (!parsed.success) throw new Error(`run ${run}: ${JSON.stringify(parsed.error.issues[0])}`);
    }
    // Both outcomes must actually happen, or the fuzzing proves nothing.
    expect(read).toBeGreaterThan(100);
    expect(refused).toBeGreaterThan(1000);
  });
});
