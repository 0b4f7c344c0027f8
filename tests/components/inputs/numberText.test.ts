import { describe, expect, it } from 'vitest';
import {
  type NumberRule,
  describeRange,
  formatNumberText,
  parseNumberText,
  rangeHint,
} from '@/components/inputs/numberText';

const level: NumberRule = { min: 0, max: 100, unit: '%' };
const channel: NumberRule = { min: 1, max: 99999, integer: true, optional: true };
const shutter: NumberRule = { min: 0, max: 60, minExclusive: true, allowFraction: true, unit: 's' };

describe('parseNumberText', () => {
  it.each([
    ['75', level, 75],
    ['75 %', level, 75],
    ['75%', level, 75],
    ['0', level, 0],
    ['100', level, 100],
    ['  12.5 ', level, 12.5],
    ['.5', level, 0.5],
    ['12', channel, 12],
    ['', channel, null],
    ['1/50', shutter, 0.02],
    ['0.5 s', shutter, 0.5],
  ])('reads %j as %j', (text, rule, value) => {
    expect(parseNumberText(text, rule)).toEqual({ ok: true, value });
  });

  it('reads the typographic minus sign', () => {
    expect(parseNumberText('\u221290', { min: -360, max: 360 })).toEqual({ ok: true, value: -90 });
  });

  it.each([
    ['120', level, '120 % is out of range: enter a number from 0 to 100 %.'],
    ['-1', level, '-1 % is out of range: enter a number from 0 to 100 %.'],
    ['abc', level, '"abc" is not a number: enter a number from 0 to 100 %.'],
    ['', level, 'Enter a number from 0 to 100 %.'],
    ['0x10', level, '"0x10" is not a number: enter a number from 0 to 100 %.'],
    ['12 6', level, '"12 6" is not a number: enter a number from 0 to 100 %.'],
    ['1.5', channel, '1.5 is not a whole number: enter a whole number from 1 to 99999, or leave it empty.'],
    ['0', channel, '0 is out of range: enter a whole number from 1 to 99999, or leave it empty.'],
    ['0', shutter, '0 s is out of range: enter a number above 0 up to 60 s.'],
    ['1/0', shutter, '"1/0" is not a number: enter a number above 0 up to 60 s.'],
    ['1/50', level, '"1/50" is not a number: enter a number from 0 to 100 %.'],
  ])('refuses %j with a message naming the range', (text, rule, message) => {
    expect(parseNumberText(text, rule)).toEqual({ ok: false, message });
  });
});

describe('range words', () => {
  it('puts degrees against the number and other units after a space', () => {
    expect(describeRange({ min: 15, max: 30, unit: '°' })).toBe('a number from 15 to 30°');
    expect(rangeHint({ min: 15, max: 30, unit: '°' })).toBe('15–30°');
    expect(rangeHint(level)).toBe('0–100 %');
    expect(rangeHint(shutter)).toBe('above 0, up to 60 s');
  });
});

describe('formatNumberText', () => {
  it.each([
    [100, 2, '100'],
    [47.7263, 1, '47.7'],
    [0.02, 2, '0.02'],
    [1.5, 0, '2'],
    [null, 2, ''],
    [Number.NaN, 2, ''],
  ])('shows %j with %j places as %j', (value, decimals, text) => {
    expect(formatNumberText(value, decimals)).toBe(text);
  });
});
