import { describe, it, expect } from 'vitest';
import { airflowWarning } from '../../src/core/airflow-warnings.ts';

describe('airflowWarning (src/core/airflow-warnings.ts)', () => {
  it('builds a plain { code, message } object', () => {
    expect(airflowWarning('vent-closed', 'The vent was closed.')).toEqual({
      code: 'vent-closed',
      message: 'The vent was closed.',
    });
  });
});
