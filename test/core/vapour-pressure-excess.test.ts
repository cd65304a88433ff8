import { describe, it, expect } from 'vitest';
import { approxEqual } from '../support/approx-equal.ts';
import { psychrolib } from './psychrolib-reference.ts';
import { humidityClassLimit, humidityClassOf, HUMIDITY_CLASS_SOURCE } from '../../src/core/humidity-classes.ts';
import { vapourPressureExcess, type LoggedHumidity } from '../../src/core/vapour-pressure-excess.ts';
import { diagnoseDamp } from '../../src/core/damp-diagnosis.ts';
import { fromLitresPerSecond } from '../../src/core/units.ts';

describe('ISO 13788 humidity classes', () => {
  it('give 270/540/810/1080/1350 Pa at or below 0 °C, falling linearly to 0 at 20 °C', () => {
    // ISO 13788:2012 Annex A (from memory; references.md §6.3).
    expect([1, 2, 3, 4, 5].map((c) => humidityClassLimit(c as 1 | 2 | 3 | 4 | 5, -5))).toEqual([270, 540, 810, 1080, 1350]);
    expect(humidityClassLimit(3, 0)).toBe(810);
    approxEqual(humidityClassLimit(3, 10), 405, { abs: 1e-9 });
    expect(humidityClassLimit(5, 20)).toBe(0);
    expect(humidityClassLimit(5, 25)).toBe(0);
    expect(HUMIDITY_CLASS_SOURCE).toMatch(/from memory/);
  });

  it('class an excess at an outdoor temperature', () => {
    expect(humidityClassOf(700, 5)).toBe(4);
    expect(humidityClassOf(100, 0)).toBe(1);
    expect(humidityClassOf(2000, 0)).toBe('above-5');
    expect(humidityClassOf(100, 20)).toBeNull();
  });
});

function days(n: number, perDay: number, inside: [number, number], outside: [number, number]): LoggedHumidity {
  const len = n * perDay;
  return {
    insideTemp_C: Array(len).fill(inside[0]),
    insideRh_pct: Array(len).fill(inside[1]),
    outsideTemp_C: Array(len).fill(outside[0]),
    outsideRh_pct: Array(len).fill(outside[1]),
    day: { kind: 'time', times_s: Array.from({ length: len }, (_, i) => (i * 86400) / perDay) },
    expectedClass: 3,
  };
}

describe('vapour-pressure excess by day', () => {
  it('averages vapour pressures by day and compares with the expected class', () => {
    // Vapour pressures paired with psychrolib GetVapPresFromRelHum (ASHRAE HoF 2017 ch. 1).
    const r = vapourPressureExcess(days(8, 24, [20, 60], [5, 85]));
    const excess = psychrolib.GetVapPresFromRelHum(20, 0.6) - psychrolib.GetVapPresFromRelHum(5, 0.85);
    expect(r.days).toHaveLength(8);
    approxEqual(r.meanExcess_Pa, excess, { rel: 1e-12 });
    approxEqual(r.days[0]?.excess_Pa ?? 0, 661.67, { abs: 0.01 });
    expect(r.days[0]?.readings).toBe(24);
    expect(r.humidityClass).toBe(4);
    expect(r.daysAboveExpected).toBe(8);
    expect(r.warnings).toEqual([]);
  });

  it('takes days as an index array too, and means each day separately', () => {
    const log: LoggedHumidity = {
      insideTemp_C: [20, 20, 18, 18],
      insideRh_pct: [50, 70, 60, 60],
      outsideTemp_C: [0, 0, 10, 10],
      outsideRh_pct: [90, 90, 80, 80],
      day: { kind: 'index', days: [3, 3, 4, 4] },
    };
    const r = vapourPressureExcess(log);
    expect(r.days.map((d) => d.day)).toEqual([3, 4]);
    // Mean of p_w at 50 % and 70 % equals p_w at 60 % (linear in RH at one temperature).
    approxEqual(r.days[0]?.insideVapour_Pa ?? 0, psychrolib.GetVapPresFromRelHum(20, 0.6), { rel: 1e-12 });
    expect(r.daysAboveExpected).toBeUndefined();
    expect(r.warnings.map((w) => w.code)).toContain('too-few-days');
  });

  it('honours a day length and start', () => {
    const log: LoggedHumidity = {
      insideTemp_C: [20, 20, 20],
      insideRh_pct: [50, 50, 50],
      outsideTemp_C: [0, 0, 0],
      outsideRh_pct: [80, 80, 80],
      day: { kind: 'time', times_s: [100, 200, 400], dayLength_s: 250, dayStart_s: 50 },
    };
    expect(vapourPressureExcess(log).days.map((d) => d.readings)).toEqual([2, 1]);
  });

  it('skips missing readings and warns on unequal series, mild days and outdoor above indoor', () => {
    const gaps = days(7, 4, [20, 50], [5, 80]);
    (gaps.insideRh_pct as number[])[0] = Number.NaN;
    expect(vapourPressureExcess(gaps).days[0]?.readings).toBe(3);
    const unequal = { ...gaps, outsideRh_pct: [80] };
    const u = vapourPressureExcess(unequal);
    expect(u.days).toEqual([]);
    expect(u.warnings.map((w) => w.code)).toEqual(['unequal-series']);
    expect(vapourPressureExcess(days(7, 4, [20, 50], [15, 80])).warnings.map((w) => w.code)).toContain('mild-days-only');
    expect(vapourPressureExcess(days(7, 4, [15, 40], [14, 95])).warnings.map((w) => w.code)).toContain('outdoor-above-indoor');
  });
});

describe('damp diagnosis: too wet, too cold, too little air', () => {
  const cold = { meanExcess_Pa: 900, meanOutsideTemp_C: 5 }; // class 3 limit at 5 °C: 607.5 Pa (ISO 13788 Annex A, from memory)
  const benchmark = { benchmark_m3s: fromLitresPerSecond(8), benchmarkLabel: 'benchmark for this room' };

  it('names too little air when the excess is high and the supply low', () => {
    const d = diagnoseDamp({ excess: cold, expectedClass: 3, supply: { measured_m3s: fromLitresPerSecond(4), ...benchmark }, surface: { factor: 0.8, neededFactor: 0.75 } });
    expect(d.findings.map((f) => f.cause)).toEqual(['too-little-air']);
    expect(d.findings[0]?.reason).toMatch(/4\.0 L\/s is below the benchmark for this room of 8\.0 L\/s/);
  });

  it('names too wet when the excess is high although the supply meets its benchmark', () => {
    const d = diagnoseDamp({ excess: cold, expectedClass: 3, supply: { measured_m3s: fromLitresPerSecond(12), ...benchmark }, surface: { factor: 0.8, neededFactor: 0.75 } });
    expect(d.findings.map((f) => f.cause)).toEqual(['too-wet']);
    expect(d.findings[0]?.reason).not.toMatch(/lifestyle/i);
  });

  it('names too cold when the excess is normal but the surface factor is low', () => {
    const d = diagnoseDamp({ excess: { meanExcess_Pa: 400, meanOutsideTemp_C: 5 }, expectedClass: 3, surface: { factor: 0.48, neededFactor: 0.75 } });
    expect(d.findings.map((f) => f.cause)).toEqual(['too-cold']);
    expect(d.findings[0]?.reason).toMatch(/moisture level is normal/);
  });

  it('keeps both moisture causes open without a supply, and says so', () => {
    const d = diagnoseDamp({ excess: cold, expectedClass: 3 });
    expect(d.findings.map((f) => f.cause)).toEqual(['too-wet-or-too-little-air']);
    expect(d.warnings.map((w) => w.code)).toEqual(['supply-unknown', 'surface-unknown']);
  });

  it('points to liquid water when no moisture cause is found', () => {
    const d = diagnoseDamp({ excess: { meanExcess_Pa: 300, meanOutsideTemp_C: 5 }, expectedClass: 3, surface: { factor: 0.9, neededFactor: 0.75 } });
    expect(d.findings.map((f) => f.cause)).toEqual(['no-moisture-cause-found']);
    expect(d.findings[0]?.reason).toMatch(/leaks, penetrating or rising damp/);
  });
});
