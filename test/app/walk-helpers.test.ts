/** Small app rules behind the walk screens: what a room still lacks, safety items, numbers as shown, local times. */
import { describe, it, expect } from 'vitest';
import { roomGaps } from '../../src/app/room-gaps.ts';
import { safetyItems } from '../../src/app/safety-items.ts';
import { bounds, quantity, range, airChanges, duration } from '../../src/app/format-figures.ts';
import { clockOf, clockSeconds, localIso } from '../../src/app/local-time.ts';
import { newRoom, newRoomUse, suggestedHeight } from '../../src/app/room-defaults.ts';
import { startingConditions } from '../../src/app/new-reading.ts';
import type { DocumentRoom } from '../../src/model/survey-document.ts';
import { roomSchema } from '../../src/model/room.ts';

const room = (): DocumentRoom => ({
  ...newRoom({ name: 'Classroom 1', use: 'classroom', geometry: { kind: 'box', length_m: 7, width_m: 7, height_m: 2.7 } }, new Date('2026-01-14T09:00:00Z')),
  readings: [],
});

describe('walk helpers', () => {
  it("starts a new room's use from the building's use (a flat's rooms are not classrooms)", () => {
    expect(newRoomUse('dwelling')).toBe('bedroom');
    expect(newRoomUse('school')).toBe('classroom');
    expect(newRoomUse('office')).toBe('office');
    expect(newRoomUse('other')).toBe('other');
    expect(suggestedHeight(newRoomUse('dwelling'))).toBe(2.4);
  });

  it('a new room is valid, keeps its size, and takes the day template of its use', () => {
    const r = newRoom({ name: 'Bedroom 1', use: 'bedroom', geometry: { kind: 'area', floorArea_m2: 11, height_m: suggestedHeight('bedroom') } }, new Date());
    expect(roomSchema.safeParse(r).success).toBe(true);
    expect(r.schedule.template).toBe('bedroom');
    expect(r.geometry).toEqual({ kind: 'area', floorArea_m2: 11, height_m: 2.4 });
  });

  it('lists what a bare room lacks, and nothing once it is complete', () => {
    const r = room();
    expect(roomGaps(r)).toEqual(['people', 'openings', 'a reading']);
    r.occupants.push({ id: crypto.randomUUID(), label: 'Pupils', count: 30, ageBand: '11-16', sex: 'mixed', activity_met: 1.2 });
    r.openings.push({ type: 'fan', id: crypto.randomUUID(), count: 1, condition: '', direction: 'extract', humidistat: 'no', isolator: 'on', ducting: 'ducted' });
    r.readings.push({ id: crypto.randomUUID(), time: '2026-01-14T09:10:00+00:00', co2_ppm: 900, conditions: startingConditions(r), note: '' });
    expect(roomGaps(r)).toEqual(['fan flow measured']);
    // A window means an outside wall, which the mould check needs.
    r.openings.push({ type: 'window', id: crypto.randomUUID(), count: 1, condition: '', style: 'hinged', restrictor: 'no', operability: 'opens' });
    expect(roomGaps(r)).toEqual(['fan flow measured', 'outside wall']);
    r.exposedWalls.push({ id: crypto.randomUUID(), construction: 'cavity-unfilled' });
    expect(roomGaps(r)).toEqual(['fan flow measured']);
  });

  it('first-reading conditions come from the room: its people in, no fans when it has none', () => {
    const r = room();
    r.occupants.push({ id: crypto.randomUUID(), label: 'Pupils', count: 28, ageBand: '11-16', sex: 'mixed', activity_met: 1.2 });
    const c = startingConditions(r);
    expect(c.people[0]!.count).toBe(28);
    expect(c.fans).toBe('none');
    expect(c.windows).toBe('none');
  });

  it('puts a missing CO alarm and an open flue among the safety items', () => {
    const r = room();
    r.appliances.push({
      id: crypto.randomUUID(), kind: 'gas-boiler', flue: 'open-flued', combustionAirVentPresent: 'yes', combustionAirVentClear: 'yes',
      coAlarmPresent: 'no', coAlarmTested: 'not-checked', gasSafetyRecordSeen: 'yes', notes: '',
    });
    expect(safetyItems([r]).map((i) => i.text)).toEqual([
      'Gas boiler: no CO alarm',
      'Gas boiler: open-flued — any extract fan here needs a spillage check by a qualified engineer',
    ]);
  });

  it('writes numbers rounded as a practitioner would, with units, and a missing value in words', () => {
    // Rounding steps from src/core/units.ts: CO2 to 10 ppm, L/s to 0.5, ACH to 0.1.
    expect(quantity(1316.47, 'co2')).toBe('1,320 ppm');
    expect(quantity(0.0523, 'flow')).toBe('52.5 L/s');
    expect(quantity(null, 'flow')).toBe('not known');
    expect(range({ value: 0.01, low: 0.008, high: 0.0131 }, 'flow')).toBe('10 L/s (8–13 L/s)');
    expect(bounds(null, 0.01, 'flow')).toBe('range not known');
    expect(airChanges({ value: 1 / 3600, low: 0.8 / 3600, high: 1.25 / 3600 })).toBe('1 h⁻¹ (0.8–1.3 h⁻¹)');
    expect(duration(3900)).toBe('1 h 05 min');
  });

  it('stamps local time with its offset, and reads the clock time back from it', () => {
    const iso = localIso(new Date(2026, 0, 14, 9, 5, 30));
    expect(iso).toMatch(/^2026-01-14T09:05:30[+-]\d\d:\d\d$/);
    expect(clockOf(iso)).toBe('09:05');
    expect(clockSeconds('2026-01-14T09:05:00+01:00')).toBe(32_700);
  });
});
