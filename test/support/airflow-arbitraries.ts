/**
 * fast-check generators of valid room airflow inputs (src/core/airflow-inputs.ts), shared by the
 * property tests of the room prediction and the airflow benchmark. Values are invented and span
 * what a survey records; they test behaviour, never a formula's numbers.
 */
import fc from 'fast-check';
import type {
  AirBrickInput,
  BackgroundVentInput,
  DoorUndercutInput,
  FanInput,
  LeakageInput,
  OpeningInput,
  RoomAirflowInput,
  TransferGrilleInput,
  WindowInput,
} from '../../src/core/airflow-inputs.ts';

const length = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const bearing = fc.constantFrom(0, 45, 90, 135, 180, 225, 270, 315);
const id = fc.string({ minLength: 1, maxLength: 6 });

export const windowArb: fc.Arbitrary<WindowInput> = fc.record({
  kind: fc.constant('window' as const),
  id,
  windowType: fc.constantFrom('side-hung', 'top-hung', 'bottom-hung', 'vertical-sliding', 'horizontal-sliding'),
  sashWidth_m: length(0.2, 2),
  sashHeight_m: length(0.2, 2),
  opening: fc.oneof(
    fc.constant({ by: 'closed' as const }),
    fc.record({ by: fc.constant('angle' as const), angle_deg: length(0, 180) }),
    fc.record({ by: fc.constant('stroke' as const), stroke_m: length(0, 1.5) }),
  ),
  condition: fc.constantFrom('works', 'restricted', 'blocked', 'seized'),
  restrictorStroke_m: fc.option(length(0, 0.3), { nil: undefined }),
  facing_deg: bearing,
  centreHeight_m: length(0.3, 2.5),
});

export const ventArb: fc.Arbitrary<BackgroundVentInput> = fc.record({
  kind: fc.constant('background-vent' as const),
  id,
  labelArea_m2: length(0, 0.02),
  areaBasis: fc.constantFrom('equivalent', 'free', 'unknown'),
  condition: fc.constantFrom('open', 'closed', 'blocked'),
  facing_deg: bearing,
  centreHeight_m: length(1.5, 2.5),
});

export const airBrickArb: fc.Arbitrary<AirBrickInput> = fc.record({
  kind: fc.constant('air-brick' as const),
  id,
  labelArea_m2: length(0, 0.02),
  areaBasis: fc.constantFrom('equivalent', 'free', 'unknown'),
  purpose: fc.constantFrom('room-supply', 'sub-floor', 'combustion-air', 'unknown'),
  condition: fc.constantFrom('clear', 'blocked'),
  facing_deg: bearing,
  centreHeight_m: length(-0.5, 2.5),
});

const undercutArb: fc.Arbitrary<DoorUndercutInput> = fc.record({
  kind: fc.constant('door-undercut' as const),
  id,
  doorWidth_m: length(0.6, 1),
  gap_m: length(0, 0.03),
});

const grilleArb: fc.Arbitrary<TransferGrilleInput> = fc.record({
  kind: fc.constant('transfer-grille' as const),
  id,
  labelArea_m2: length(0, 0.02),
  areaBasis: fc.constantFrom('equivalent', 'free', 'unknown'),
});

export const openingArb: fc.Arbitrary<OpeningInput> = fc.oneof(windowArb, ventArb, airBrickArb, undercutArb, grilleArb);

export const fanArb: fc.Arbitrary<FanInput> = fc.record({
  kind: fc.constant('fan' as const),
  id,
  role: fc.constantFrom('extract', 'supply', 'recirculating'),
  system: fc.constantFrom('local', 'whole-dwelling-extract', 'whole-dwelling-supply', 'whole-dwelling-balanced'),
  running: fc.boolean(),
  measuredFlow_m3s: fc.option(length(0, 0.1), { nil: undefined }),
  ratedFlow_m3s: fc.option(length(0, 0.1), { nil: undefined }),
});

export const leakageArb: fc.Arbitrary<LeakageInput> = fc.record({
  id,
  source: fc.oneof(
    fc.record({ basis: fc.constant('measured-air-permeability' as const), q50_m3hm2: length(0, 30) }),
    fc.record({
      basis: fc.constant('effective-leakage-area' as const),
      dwellingLeakageArea_m2: length(0, 0.2),
      dwellingEnvelope_m2: length(0, 500),
    }),
    fc.record({
      basis: fc.constant('assumed' as const),
      assumed: fc.oneof(
        fc.record({
          by: fc.constant('age' as const),
          ageBand: fc.constantFrom('before-1919', '1919-1944', '1945-1964', '1965-1980', '1981-1995', '1996-2005', '2006-2013', '2014-on'),
        }),
        fc.record({
          by: fc.constant('construction' as const),
          structure: fc.constantFrom('masonry', 'timber-or-steel-frame'),
          floor: fc.constantFrom('suspended-timber-unsealed', 'suspended-timber-sealed', 'solid-or-other'),
          draughtLobby: fc.boolean(),
          draughtProofedPercent: length(0, 100),
          storeys: fc.integer({ min: 1, max: 4 }),
        }),
      ),
    }),
  ),
  roomExposedEnvelope_m2: fc.oneof(fc.constant(0), length(0, 60)),
  storeys: fc.constantFrom(1, 2, 3),
  shelterClass: fc.constantFrom(1, 2, 3, 4, 5),
  shelteredSides: fc.integer({ min: 0, max: 4 }),
  includesLeakageToNeighbours: fc.option(fc.boolean(), { nil: undefined }),
});

export const roomArb: fc.Arbitrary<RoomAirflowInput> = fc.record({
  id,
  ceilingHeight_m: length(2.2, 4),
  depth_m: fc.option(length(2, 15), { nil: undefined }),
  openings: fc.array(openingArb, { maxLength: 6 }),
  fans: fc.array(fanArb, { maxLength: 2 }),
  leakage: fc.option(leakageArb, { nil: undefined }),
  crossPath: fc.option(
    fc.record({
      internalPathOpen: fc.boolean(),
      farOpenArea_m2: length(0, 1),
      farFacing_deg: bearing,
      internalOpeningArea_m2: length(0, 2),
    }),
    { nil: undefined },
  ),
  site: fc.record({
    terrain: fc.constantFrom('open-flat-country', 'country-scattered-windbreaks', 'urban', 'city'),
    buildingHeight_m: length(2, 40),
  }),
});
