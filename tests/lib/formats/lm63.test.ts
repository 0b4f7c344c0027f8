import { describe, expect, it } from 'vitest';
import { PhotometryFileError, readPhotometryFile } from '@/lib/formats';
import { cosinePower, isotropic, lambertian, lopsided, oval, range, writeLm63 } from './synthetic';

// REFERENCE-CHECKS §5a, synthetic file A (invented): isotropic 1000 cd, absolute photometry.
const FILE_A = `IESNA:LM-63-2002
[TEST] REFSHEET-A
[TESTLAB] none (synthetic)
[ISSUEDATE] 2024-01-01
[MANUFAC] none (synthetic test data)
[LUMINAIRE] Ideal isotropic point source 1000 cd
TILT=NONE
1 -1 1.0 19 1 1 2 0.0 0.0 0.0
1.0 1.0 100
0 10 20 30 40 50 60 70 80 90 100 110 120 130 140 150 160 170 180
0
1000 1000 1000 1000 1000 1000 1000 1000 1000 1000
1000 1000 1000 1000 1000 1000 1000 1000 1000
`;

// REFERENCE-CHECKS §5a, synthetic file B (invented): Lambertian downlight, multiplier 2, quadrant symmetry.
const FILE_B = `IESNA:LM-63-2002
[TEST] REFSHEET-B
[TESTLAB] none (synthetic)
[ISSUEDATE] 2024-01-01
[MANUFAC] none (synthetic test data)
TILT=NONE
1 4000 2.0 19 2 1 2 0.0 0.0 0.0
1.0 1.0 40
0 5 10 15 20 25 30 35 40 45 50 55 60 65 70 75 80 85 90
0 90
500.0 498.1 492.4 483.0 469.8 453.2 433.0 409.6 383.0 353.6
321.4 286.8 250.0 211.3 171.0 129.4 86.8 43.6 0.0
500.0 498.1 492.4 483.0 469.8 453.2 433.0 409.6 383.0 353.6
321.4 286.8 250.0 211.3 171.0 129.4 86.8 43.6 0.0
`;

describe('IES LM-63: the reference files', () => {
  it('file A: 1000 cd everywhere, 12 566.37 lm, absolute photometry (REFERENCE-CHECKS §5a [DER])', () => {
    const file = readPhotometryFile(FILE_A, 'a.ies');
    expect(file.formatVersion).toBe('LM-63-2002');
    expect(file.title).toBe('Ideal isotropic point source 1000 cd');
    expect(file.intensityCd(37, 123)).toBe(1000);
    expect(file.peakCd).toBe(1000);
    expect(file.totalLumens).toBeCloseTo(12566.37, 2);
    expect(file.totalLumens / (file.inputWatts ?? 1)).toBeCloseTo(125.66, 2);
    expect(file.ratedLampLumens).toBeNull();
    expect(file.efficiency).toBeNull();
    expect(file.grid.symmetry).toBe('rotational');
    // Never falls to 50 %: the edge is the end of the range in both half-planes.
    expect(file.beamAngleDeg).toBe(360);
    // 250 lx at 2 m, normal incidence: 1000 / 2² [DER].
    expect(file.intensityCd(0, 0) / 4).toBe(250);
  });

  it('file B: 1000·cos γ after the multiplier, 3141.59 lm ± 0.5 %, 78.54 % of the 4000 lm lamp (§5a)', () => {
    const file = readPhotometryFile(FILE_B, 'b.ies');
    expect(file.grid.symmetry).toBe('quadrant');
    for (const c of [0, 45, 90, 200, 300]) expect(file.intensityCd(30, c)).toBeCloseTo(866, 0);
    expect(Math.abs(file.totalLumens / 3141.59 - 1)).toBeLessThan(0.005);
    expect(file.ratedLampLumens).toBe(4000);
    expect(file.efficiency).toBeCloseTo(0.7854, 2);
    // Horizontal illuminance 3 m below: 111.111 lx under it; 62.500 lx at 30° off (1000·cos⁴30°/9) [DER].
    expect(file.intensityCd(0, 0) / 9).toBeCloseTo(111.111, 3);
    const gamma = 30;
    const distance = 3 / Math.cos((gamma * Math.PI) / 180);
    const lux = (file.intensityCd(gamma, 0) * Math.cos((gamma * Math.PI) / 180)) / distance ** 2;
    expect(lux).toBeCloseTo(62.5, 1);
    // Beam angle 2·60° and field angle 2·acos(0.1) = 168.52° for I0·cos γ [DER].
    expect(file.beamAngleDeg).toBeCloseTo(120, 6);
    expect(file.fieldAngleDeg).toBeCloseTo(168.52, 0);
  });
});

describe('IES LM-63: layouts and fields', () => {
  const vertical = range(0, 90, 5);
  it.each(['1986', '1991', '1995', '2002', '2019'] as const)('reads the %s layout alike', (version) => {
    const file = readPhotometryFile(
      writeLm63({ version, vertical, horizontal: [0], intensity: lambertian(800) }),
      'x.ies',
    );
    expect(file.formatVersion).toBe(`LM-63-${version}`);
    expect(file.intensityCd(20, 0)).toBeCloseTo(800 * Math.cos((20 * Math.PI) / 180), 5);
  });

  it('keeps keywords with [MORE] continuations and the original text', () => {
    const text = writeLm63({ vertical, horizontal: [0], intensity: lambertian(800) });
    const file = readPhotometryFile(text, 'x.ies');
    expect(file.keywords.LUMINAIRE).toBe('Synthetic distribution\nwritten by the tests from a formula');
    expect(file.originalText).toBe(text);
  });

  it('reads TILT=INCLUDE, keeping its factors, and values separated by commas and wrapped lines', () => {
    const text = writeLm63({
      vertical,
      horizontal: [0],
      intensity: lambertian(800),
      separator: ', ',
      perLine: 7,
    }).replace('TILT=NONE', 'TILT=INCLUDE\r\n1\r\n3\r\n0 45 90\r\n1.0 0.95 0.9');
    const file = readPhotometryFile(text, 'x.ies');
    expect(file.keywords.TILT).toBe('INCLUDE geometry 1; angles 0 45 90; factors 1 0.95 0.9');
    expect(file.intensityCd(0, 0)).toBeCloseTo(800, 6);
    expect(file.warnings.join()).toMatch(/not applied/);
  });

  it('accepts LF, CRLF and CR line ends', () => {
    for (const lineEnd of ['\n', '\r\n', '\r']) {
      const file = readPhotometryFile(
        writeLm63({ vertical, horizontal: [0], intensity: lambertian(1), lineEnd }),
        'x.ies',
      );
      expect(file.peakCd).toBeCloseTo(1, 9);
    }
  });

  it('applies the candela multiplier and converts feet to metres (1 ft = 0.3048 m)', () => {
    const file = readPhotometryFile(
      writeLm63({
        vertical,
        horizontal: [0],
        intensity: lambertian(1000),
        multiplier: 4,
        unitsType: 1,
        dimensions: [1, 2, 0.5],
      }),
      'x.ies',
    );
    expect(file.peakCd).toBeCloseTo(1000, 6);
    expect(file.luminousOpening).toEqual({ widthM: 0.3048, lengthM: 0.6096, heightM: 0.1524 });
  });

  it('refuses photometric types A and B with a clear message on their line', () => {
    for (const [type, letter] of [
      [2, 'B'],
      [3, 'A'],
    ] as const) {
      const text = writeLm63({ vertical, horizontal: [0], intensity: lambertian(1), photometricType: type });
      let error: unknown;
      try {
        readPhotometryFile(text, 'ab.ies');
      } catch (caught) {
        error = caught;
      }
      expect(error).toBeInstanceOf(PhotometryFileError);
      expect((error as PhotometryFileError).line).toBe(9);
      expect((error as PhotometryFileError).message).toMatch(
        new RegExp(`type ${letter}\\) is not supported`),
      );
    }
  });
});

describe('IES LM-63: each symmetry gives the intensities of the full distribution', () => {
  const vertical = range(0, 180, 5);
  const full = range(0, 360, 15);
  const probes = [
    [0, 0],
    [12.5, 37],
    [40, 100],
    [63, 222],
    [85, 301],
    [30, 359],
  ];
  it.each([
    ['rotational', [0], cosinePower(1000, 6)],
    ['quadrant', range(0, 90, 15), oval],
    ['c0-c180', range(0, 180, 15), oval],
    ['c90-c270', range(90, 270, 15), oval],
    ['none', full, lopsided],
  ] as const)('%s', (symmetry, horizontal, intensity) => {
    const part = readPhotometryFile(
      writeLm63({ vertical, horizontal: [...horizontal], intensity }),
      'part.ies',
    );
    const whole = readPhotometryFile(writeLm63({ vertical, horizontal: full, intensity }), 'whole.ies');
    expect(part.grid.symmetry).toBe(symmetry);
    for (const [gamma, c] of probes)
      expect(part.intensityCd(gamma, c)).toBeCloseTo(whole.intensityCd(gamma, c), 6);
    expect(part.totalLumens).toBeCloseTo(whole.totalLumens, 4);
    expect(part.beamAngleDeg).toBeCloseTo(whole.beamAngleDeg, 6);
    expect(part.fieldAngleCrossDeg).toBeCloseTo(whole.fieldAngleCrossDeg, 6);
  });

  it('an oval reports its narrow and wide planes and their min/max', () => {
    const file = readPhotometryFile(
      writeLm63({ vertical: range(0, 90, 1), horizontal: range(0, 90, 5), intensity: oval }),
      'o.ies',
    );
    // oval: cos^30 across C0–C180, cos^6 across C90–C270: beam 2·acos(0.5^(1/n)) [DER].
    expect(file.beamAngleDeg).toBeCloseTo((2 * (Math.acos(0.5 ** (1 / 30)) * 180)) / Math.PI, 1);
    expect(file.beamAngleCrossDeg).toBeCloseTo((2 * (Math.acos(0.5 ** (1 / 6)) * 180)) / Math.PI, 1);
    expect(file.beamAngleMinDeg).toBeCloseTo(file.beamAngleDeg, 6);
    expect(file.beamAngleMaxDeg).toBeCloseTo(file.beamAngleCrossDeg, 6);
  });

  it('isotropic 500 cd as a full-sphere grid with no symmetry still gives 4π·500 lm', () => {
    const file = readPhotometryFile(
      writeLm63({ vertical, horizontal: full, intensity: isotropic(500) }),
      'iso.ies',
    );
    expect(file.totalLumens).toBeCloseTo(4 * Math.PI * 500, 6);
  });
});
