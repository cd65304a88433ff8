/**
 * Which criteria apply to a room, and in what role: a LIMIT the room can pass or fail, a
 * BENCHMARK to compare with (never pass or fail), or a DUTY without a number.
 *
 * The rule (practice.md §1.11 and §4): guidance for new work applies as a limit only to new
 * work of its kind. For an existing building it is shown as a labelled benchmark — "what
 * current guidance sets for new homes", never "fails ADF" — and an existing home never gets
 * new-build guidance as a pass/fail limit, whatever the data say. Within a group of
 * alternatives (a BB101 row per situation), an existing school is compared with the
 * refurbishment row before the new-build one.
 */
import type { BuildingUse } from '../building-uses.ts';
import { moistureWarning, type MoistureWarning } from '../moisture-warnings.ts';
import { criterionCaveat } from './criterion-caveat.ts';
import { allCriteria } from './criteria-sets.ts';
import type { BuildingSituation, Criterion, CriterionStatus, Tenure, VentilationType } from './criterion.ts';

/** The room being judged. */
export interface RoomContext {
  buildingUse: BuildingUse;
  /** A room-use id, or 'whole-dwelling' for dwelling totals. */
  roomUse: string;
  situation: BuildingSituation;
  ventilation: VentilationType | 'unknown';
  /** For dwellings; absent when not known. */
  tenure?: Tenure;
}

/** How a selected criterion may be used. */
export type CriterionRole = 'limit' | 'benchmark' | 'duty';

/** A criterion chosen for a room, with its role, a label for the report, its caveat and the reason. */
export interface SelectedCriterion {
  criterion: Criterion;
  role: CriterionRole;
  label: string;
  caveat: string;
  reason: string;
}

const STATUS_WORDS: Record<CriterionStatus, string> = {
  law: 'legal duty',
  'approved-code-of-practice': 'Approved Code of Practice',
  'statutory-guidance': 'statutory guidance for building work',
  'design-guidance-new-work': 'design guidance for new and refurbished buildings',
  guidance: 'guidance',
  benchmark: 'benchmark',
};

const NEW_WORK_STATUSES: readonly CriterionStatus[] = ['statutory-guidance', 'design-guidance-new-work'];

const BUILDING_WORDS: Record<BuildingUse, string> = { dwelling: 'homes', school: 'schools', office: 'workplaces', other: 'buildings' };

function covers(c: Criterion, ctx: RoomContext): boolean {
  const k = c.covers;
  if (!k.buildingUses.includes(ctx.buildingUse)) return false;
  if (k.roomUses !== 'any' && !k.roomUses.includes(ctx.roomUse)) return false;
  if (k.roomUses === 'any' && ctx.roomUse === 'whole-dwelling' && c.metric !== 'qualitative-duty') return false;
  if (k.tenures && ctx.tenure && !k.tenures.includes(ctx.tenure)) return false;
  if (k.ventilation !== 'any' && ctx.ventilation !== 'unknown' && !k.ventilation.includes(ctx.ventilation)) return false;
  return true;
}

/** The situations whose rows stand in, as benchmarks, when no row covers the room's own situation. */
const FALLBACK: Record<BuildingSituation, readonly BuildingSituation[]> = {
  new: [],
  refurbished: ['new'],
  existing: ['refurbished', 'new'],
};

function pickForSituation(rows: readonly Criterion[], situation: BuildingSituation): { rows: Criterion[]; standIn?: BuildingSituation } {
  const exact = rows.filter((c) => c.covers.situations.includes(situation));
  if (exact.length > 0) return { rows: exact };
  for (const other of FALLBACK[situation]) {
    const stand = rows.filter((c) => c.covers.situations.includes(other));
    if (stand.length > 0) return { rows: stand, standIn: other };
  }
  return { rows: [] };
}

/**
 * The criteria that apply to a room, each with its role. Duties come first, then limits, then
 * benchmarks, in data order within each.
 * Example: an existing privately rented flat's bedroom, natural ventilation → duties
 * 'hhsrs-damp-mould' and 'fitness-for-habitation'; limit 'bs5250-surface-rh'; benchmarks
 * including 'adf-2021-background-vent-habitable' ("what current guidance sets for … homes"),
 * 'adf-2021-purge-window' and 'en16798-res-co2-ii' — no ADF row as a limit.
 */
export function selectCriteria(
  ctx: RoomContext,
  criteria: readonly Criterion[] = allCriteria(),
): { selected: SelectedCriterion[]; warnings: MoistureWarning[] } {
  const warnings: MoistureWarning[] = [];
  const groups = new Map<string, Criterion[]>();
  for (const c of criteria) {
    if (!covers(c, ctx)) continue;
    groups.set(c.group, [...(groups.get(c.group) ?? []), c]);
  }
  const selected: SelectedCriterion[] = [];
  let standInUsed = false;
  let ventilationGuessed = false;
  let tenureMissing = false;
  for (const rows of groups.values()) {
    const pick = pickForSituation(rows, ctx.situation);
    for (const c of pick.rows) {
      const caveat = criterionCaveat(c);
      const status = STATUS_WORDS[c.status];
      if (c.metric === 'qualitative-duty') {
        const tenureNote = c.covers.tenures && !ctx.tenure ? ' (applies if the home is rented as shown; tenure not recorded)' : '';
        tenureMissing ||= tenureNote !== '';
        selected.push({ criterion: c, role: 'duty', label: `${c.title}: ${status}${tenureNote}`, caveat, reason: 'a duty without a numeric limit' });
        continue;
      }
      const newWorkOnExisting = ctx.situation === 'existing' && NEW_WORK_STATUSES.includes(c.status);
      const ventilationUnknown = ctx.ventilation === 'unknown' && c.covers.ventilation !== 'any';
      if (pick.standIn || newWorkOnExisting) {
        standInUsed = true;
        const forWork = pick.standIn === 'refurbished' || c.covers.situations.includes('refurbished') ? 'new or refurbished' : 'new';
        selected.push({
          criterion: c,
          role: 'benchmark',
          label: `Benchmark: what current guidance sets for ${forWork} ${BUILDING_WORDS[ctx.buildingUse]} (${c.title}); not a requirement for this ${ctx.situation} building`,
          caveat,
          reason: `${status} for ${forWork} work, shown for comparison only`,
        });
      } else if (ventilationUnknown) {
        ventilationGuessed = true;
        selected.push({ criterion: c, role: 'benchmark', label: `Benchmark: ${c.title} (ventilation type not recorded)`, caveat, reason: 'the row depends on the ventilation type, which was not recorded' });
      } else {
        const role: CriterionRole = c.status === 'benchmark' ? 'benchmark' : 'limit';
        selected.push({ criterion: c, role, label: `${c.title}: ${status}`, caveat, reason: `covers ${ctx.situation} ${BUILDING_WORDS[ctx.buildingUse]}` });
      }
    }
  }
  if (standInUsed) {
    warnings.push(
      moistureWarning(
        'new-work-guidance-as-benchmark',
        'Guidance for new or refurbished buildings is shown as a benchmark only; it is not a standard this building has to meet.',
      ),
    );
  }
  if (ventilationGuessed) {
    warnings.push(moistureWarning('ventilation-unknown', 'The ventilation type was not recorded, so rows that depend on it are shown as benchmarks only.'));
  }
  if (tenureMissing) {
    warnings.push(moistureWarning('tenure-unknown', 'The tenure was not recorded, so duties that apply only to rented homes are listed with that condition.'));
  }
  const order: Record<CriterionRole, number> = { duty: 0, limit: 1, benchmark: 2 };
  selected.sort((a, b) => order[a.role] - order[b.role]);
  return { selected, warnings };
}
