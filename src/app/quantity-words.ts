/**
 * Plain words and stored units for the quantities an instrument measures, as the visit screen,
 * the instrument form and the side-by-side check show them (offsets are in these units).
 *
 * Example: QUANTITY_WORDS.co2 = 'CO₂'; QUANTITY_UNITS.co2 = 'ppm'; QUANTITY_UNITS.airflow = 'm³/s'.
 */
import type { MeasuredQuantity } from '../model/instrument.ts';

export const QUANTITY_WORDS: Record<MeasuredQuantity, string> = {
  co2: 'CO₂',
  temperature: 'Temperature',
  'relative-humidity': 'Relative humidity',
  'surface-temperature': 'Surface temperature',
  airflow: 'Airflow (fan flow)',
  'air-speed': 'Air speed',
  pressure: 'Pressure',
  'moisture-content': 'Moisture content',
};

/** Units of each quantity as stored. */
export const QUANTITY_UNITS: Record<MeasuredQuantity, string> = {
  co2: 'ppm',
  temperature: '°C',
  'relative-humidity': '%',
  'surface-temperature': '°C',
  airflow: 'm³/s',
  'air-speed': 'm/s',
  pressure: 'Pa',
  'moisture-content': '%',
};
