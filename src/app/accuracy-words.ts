/**
 * A stated accuracy in words, as makers write it and the instrument list shows it: the fixed
 * part in the form's unit (L/s for airflow), the percent of reading when there is one.
 *
 * Examples: { co2, 50, 3 } → 'CO₂ ±(50 ppm + 3 % of reading)'; { temperature, 0.5, 0 } →
 * 'Temperature ±0.5 °C'; { airflow, 0, 5 } → 'Airflow (fan flow) ±5 % of reading'.
 */
import type { Instrument } from '../model/instrument.ts';
import { ACCURACY_UNITS } from './instrument-draft.ts';
import { QUANTITY_WORDS } from './quantity-words.ts';

export function accuracyWords(accuracy: Instrument['accuracy'][number]): string {
  const { unit, perStored } = ACCURACY_UNITS[accuracy.quantity];
  const fixed = `${Number((accuracy.plusMinus * perStored).toPrecision(10))} ${unit}`;
  const percent = `${accuracy.percentOfReading} % of reading`;
  const parts =
    accuracy.percentOfReading === 0 ? `±${fixed}` : accuracy.plusMinus === 0 ? `±${percent}` : `±(${fixed} + ${percent})`;
  return `${QUANTITY_WORDS[accuracy.quantity]} ${parts}`;
}
