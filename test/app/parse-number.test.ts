import { describe, it, expect } from 'vitest';
import { parseTypedNumber } from '../../src/app/parse-number.ts';

describe('typed numbers', () => {
  it.each([
    ['2.4', 2.4],
    ['2,4', 2.4],
    [' 2,40 ', 2.4],
    ['0', 0],
    ['-3,5', -3.5],
    ['−3.5', -3.5],
    ['.5', 0.5],
    [',5', 0.5],
    ['7.', 7],
    ['1500', 1500],
  ])('reads %j as %d', (typed, value) => {
    expect(parseTypedNumber(typed, 'Value')).toEqual({ ok: true, value });
  });

  it('reads an empty or blank field as empty, never 0', () => {
    expect(parseTypedNumber('', 'Room height')).toEqual({ ok: true, value: undefined });
    expect(parseTypedNumber('   ', 'Room height')).toEqual({ ok: true, value: undefined });
  });

  it.each(['2.4m', 'abc', '1,500.5', '1.2.3', '2 4', '--1', '1e3', 'Infinity', 'NaN', ',', '-'])('refuses %j, naming the field', (typed) => {
    expect(parseTypedNumber(typed, 'Room height')).toEqual({ ok: false, message: 'Room height: type a number such as 2.4 or 2,4' });
  });

  it('never gives -0', () => {
    const parsed = parseTypedNumber('-0', 'Offset');
    expect(parsed.ok && Object.is(parsed.value, 0)).toBe(true);
  });
});
