/**
 * Room humidity in the coldest month: the steady humidity-ratio balance run with the month's
 * mean outdoor temperature and RH and the room's mean daily moisture release. ISO 13788 and
 * BS 5250 judge mould on monthly means, so this is the state a mould check should use, not the
 * survey day (a mild day with windows open is not the winter condition).
 *
 * When the local monthly means are not known, a screening case is used and the result says
 * so: a UK coldest month of about 4 °C mean and 87 % mean RH (from memory, from the UK climate
 * averages of recent decades; not yet confirmed against the Met Office 1991–2020 averages).
 */
import { steadyIndoorHumidity, type MoistureBalanceConditions, type MoistureBalanceResult } from './moisture-balance.ts';
import { moistureWarning } from './moisture-warnings.ts';

/** A month's mean outdoor condition. */
export interface MonthlyOutdoorMean {
  temp_C: number;
  rh_pct: number;
  /** Where the means come from. */
  source: string;
}

/** The assumed screening case for a UK coldest month (from memory; see the file note). */
export const UK_COLDEST_MONTH_SCREENING: MonthlyOutdoorMean = {
  temp_C: 4,
  rh_pct: 87,
  source: 'Assumed screening case: UK coldest-month mean about 4 °C and 87 % RH (from memory; use local monthly means where known)',
};

/** Inputs: the room's balance without its outdoor state, plus the month (optional). */
export interface ColdestMonthInput extends Omit<MoistureBalanceConditions, 'outdoorTemp_C' | 'outdoorRh_pct'> {
  /** The coldest month's mean outdoor condition; when absent the UK screening case is used. */
  month?: MonthlyOutdoorMean;
}

/** The balance result with the month it was computed for. */
export interface ColdestMonthResult extends MoistureBalanceResult {
  month: MonthlyOutdoorMean;
}

/**
 * Steady room humidity for the coldest month's mean outdoor condition. `source_kgs` should be
 * the room's mean release over the day (for example householdMoisture(…).meanRate_kgs shared
 * over the dwelling, or moistureOverPeriod(…).meanRate_kgs).
 * Example: a 120 m³ flat at 0.5 ACH (0.01667 m³/s), 10 kg/day (1.157e-4 kg/s), 20 °C, with the
 * screening month (4 °C, 87 %) → 69.8 % RH, vapour-pressure excess 924 Pa.
 */
export function coldestMonthIndoorHumidity(input: ColdestMonthInput): ColdestMonthResult {
  const month = input.month ?? UK_COLDEST_MONTH_SCREENING;
  const result = steadyIndoorHumidity({ ...input, outdoorTemp_C: month.temp_C, outdoorRh_pct: month.rh_pct });
  if (!input.month) {
    result.warnings.push(
      moistureWarning(
        'screening-case',
        'No local monthly climate was given, so an assumed UK coldest month (about 4 °C, 87 % RH) was used: a screening estimate only.',
      ),
    );
  }
  return { ...result, month };
}
