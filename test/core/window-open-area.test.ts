import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { approxEqual } from '../support/approx-equal.ts';
import { ASSUMED_RESTRICTOR_STROKE_M, windowOpenArea } from '../../src/core/window-open-area.ts';
import { hingedWindowArea } from '../../src/core/hinged-window-area.ts';
import { hungWindowArea } from '../../src/core/hung-window-area.ts';
import type { WindowInput } from '../../src/core/airflow-inputs.ts';
import { exampleWindow } from '../support/airflow-examples.ts';

describe('windowOpenArea (src/core/window-open-area.ts)', () => {
  it('side-hung uses the geometric method with the hinge on the tall side', () => {
    // references.md §3.4 geometric method; a 1.0 m, b 0.6 m at 30° (references.md §7.4 [D]).
    const r = windowOpenArea(exampleWindow());
    approxEqual(r.area_m2, 0.42402, { abs: 5e-5 });
    expect(r.openingHeight_m).toBe(1.0);
    expect(r.warnings).toEqual([]);
  });

  it('top- and bottom-hung use the CEN/TR 16798-8 coefficient; a stroke becomes an angle', () => {
    // CEN/TR 16798-8 via AixLib (references.md §3.4 [C]).
    approxEqual(windowOpenArea(exampleWindow({ windowType: 'top-hung' })).area_m2, hungWindowArea(0.6, 30), { rel: 1e-12 });
    // A stroke of 2·1.0·sin(15°) at the free edge of a 1.0 m high sash is 30°.
    const stroke = 2 * 1.0 * Math.sin(Math.PI / 12);
    const r = windowOpenArea(exampleWindow({ windowType: 'bottom-hung', opening: { by: 'stroke', stroke_m: stroke } }));
    approxEqual(r.area_m2, hungWindowArea(0.6, 30), { rel: 1e-9 });
  });

  it('sliding sashes open by their gap', () => {
    const v = windowOpenArea(exampleWindow({ windowType: 'vertical-sliding', opening: { by: 'stroke', stroke_m: 0.2 } }));
    approxEqual(v.area_m2, 0.12, { rel: 1e-12 });
    expect(v.openingHeight_m).toBe(0.2);
    const h = windowOpenArea(exampleWindow({ windowType: 'horizontal-sliding', opening: { by: 'stroke', stroke_m: 0.2 } }));
    approxEqual(h.area_m2, 0.2, { rel: 1e-12 });
    const angled = windowOpenArea(exampleWindow({ windowType: 'vertical-sliding' }));
    expect(angled.area_m2).toBe(0);
    expect(angled.warnings[0]?.code).toBe('opening-measure-not-applicable');
  });

  it('restricted sashes count only to the restrictor; unknown restrictors assume 100 mm', () => {
    const r = windowOpenArea(exampleWindow({ condition: 'restricted', restrictorStroke_m: 0.1, opening: { by: 'angle', angle_deg: 90 } }));
    const angle = (2 * Math.asin(0.1 / 1.2) * 180) / Math.PI;
    approxEqual(r.area_m2, hingedWindowArea(1.0, 0.6, angle), { rel: 1e-9 });
    expect(r.warnings[0]?.code).toBe('sash-restricted');
    const unknown = windowOpenArea(exampleWindow({ condition: 'restricted', opening: { by: 'angle', angle_deg: 90 } }));
    expect(ASSUMED_RESTRICTOR_STROKE_M).toBe(0.1);
    approxEqual(unknown.area_m2, r.area_m2, { rel: 1e-12 });
  });

  it('angles above 90° count as 90° and say so', () => {
    const r = windowOpenArea(exampleWindow({ opening: { by: 'angle', angle_deg: 170 } }));
    approxEqual(r.area_m2, 0.6, { rel: 1e-12 });
    expect(r.warnings[0]?.code).toBe('opening-angle-limited');
  });

  it('property: blocked or seized sashes and closed windows never add area', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<WindowInput['windowType']>('side-hung', 'top-hung', 'bottom-hung', 'vertical-sliding', 'horizontal-sliding'),
        fc.constantFrom<WindowInput['condition']>('blocked', 'seized'),
        fc.double({ min: 0, max: 180, noNaN: true }),
        (windowType, condition, angle) => {
          expect(windowOpenArea(exampleWindow({ windowType, condition, opening: { by: 'angle', angle_deg: angle } })).area_m2).toBe(0);
          expect(windowOpenArea(exampleWindow({ windowType, condition, opening: { by: 'stroke', stroke_m: angle / 100 } })).area_m2).toBe(0);
          expect(windowOpenArea(exampleWindow({ windowType, opening: { by: 'closed' } })).area_m2).toBe(0);
        },
      ),
    );
  });

  it('property: opening further never gives less area', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<WindowInput['windowType']>('side-hung', 'top-hung', 'bottom-hung', 'vertical-sliding', 'horizontal-sliding'),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (windowType, s, extra) => {
          const a = windowOpenArea(exampleWindow({ windowType, opening: { by: 'stroke', stroke_m: s } })).area_m2;
          const b = windowOpenArea(exampleWindow({ windowType, opening: { by: 'stroke', stroke_m: s + extra } })).area_m2;
          expect(Number.isNaN(a)).toBe(false);
          expect(b).toBeGreaterThanOrEqual(a - 1e-15);
        },
      ),
    );
  });
});
