/**
 * A check's value beside its limit (src/app/format-figures.ts criterionFigure): rounded as a
 * practitioner writes it, except that a value which rounds to the limit's own figure without
 * being the limit keeps a finer step, so the page never shows "80 %" meeting "limit 80 %" — and
 * the moisture reason says "79.6 %" beside "below 80 %" (src/core/judgement/room-moisture.ts).
 */
import { describe, it, expect } from 'vitest';
import { criterionFigure } from '../../src/app/format-figures.ts';

describe('a criterion figure beside its limit', () => {
  it('keeps the usual rounding away from the limit, and a finer step where it would read as the limit', () => {
    expect(criterionFigure('surface-rh', 63.4)).toBe('63%');
    expect(criterionFigure('surface-rh', 79.6, 'si', 80)).toBe('79.6%');
    expect(criterionFigure('surface-rh', 80, 'si', 80)).toBe('80%');
    expect(criterionFigure('surface-rh', 63.4, 'si', 80)).toBe('63%');
    expect(criterionFigure('co2-absolute', 1496, 'si', 1500)).toBe('1,496 ppm');
    expect(criterionFigure('co2-absolute', 1430, 'si', 1500)).toBe('1,430 ppm');
  });
});
