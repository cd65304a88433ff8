/**
 * Example airflow inputs for tests, in an invented scenario (a south-facing flat on a 6 m urban
 * block). Each builder takes overrides, so a test states only what it is about.
 */
import type { AirBrickInput, BackgroundVentInput, RoomAirflowInput, WindowInput } from '../../src/core/airflow-inputs.ts';

/** A 0.6 m wide, 1.0 m high side-hung sash open 30°, facing south, centre 1.5 m above the floor. */
export const exampleWindow = (over: Partial<WindowInput> = {}): WindowInput => ({
  kind: 'window',
  id: 'south-sash',
  windowType: 'side-hung',
  sashWidth_m: 0.6,
  sashHeight_m: 1.0,
  opening: { by: 'angle', angle_deg: 30 },
  condition: 'works',
  facing_deg: 180,
  centreHeight_m: 1.5,
  ...over,
});

/** An open 8000 mm² equivalent-area trickle vent at 2.1 m, facing south. */
export const exampleVent = (over: Partial<BackgroundVentInput> = {}): BackgroundVentInput => ({
  kind: 'background-vent',
  id: 'bed-vent',
  labelArea_m2: 0.008,
  areaBasis: 'equivalent',
  condition: 'open',
  facing_deg: 180,
  centreHeight_m: 2.1,
  ...over,
});

/** A clear 5000 mm² (free area) air brick that ventilates the room, facing east. */
export const exampleAirBrick = (over: Partial<AirBrickInput> = {}): AirBrickInput => ({
  kind: 'air-brick',
  id: 'kitchen-brick',
  labelArea_m2: 0.005,
  areaBasis: 'free',
  purpose: 'room-supply',
  condition: 'clear',
  facing_deg: 90,
  centreHeight_m: 2.2,
  ...over,
});

/** A 2.4 m high, 4 m deep room with the example window, no fans, no leakage entry. */
export const exampleRoom = (over: Partial<RoomAirflowInput> = {}): RoomAirflowInput => ({
  id: 'flat-3-living',
  ceilingHeight_m: 2.4,
  depth_m: 4,
  openings: [exampleWindow()],
  fans: [],
  site: { terrain: 'urban', buildingHeight_m: 6 },
  ...over,
});
