/**
 * The engine has no clock and no randomness of its own: time and seeds are parameters.
 * This test reads every source file under src/core and fails on Date.now, new Date( or
 * Math.random, naming the file and line.
 */
import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';

const coreDir = new URL('../../src/core/', import.meta.url).pathname;
const forbidden = [/Date\.now/, /new\s+Date\s*\(/, /Math\.random/];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.ts$/.test(name) ? [path] : [];
  });
}

describe('src/core purity', () => {
  it('has source files to check', () => {
    expect(sourceFiles(coreDir).length).toBeGreaterThan(0);
  });

  it('never reads the clock or Math.random', () => {
    const offences: string[] = [];
    for (const file of sourceFiles(coreDir)) {
      readFileSync(file, 'utf8')
        .split('\n')
        .forEach((line, i) => {
          for (const pattern of forbidden) {
            if (pattern.test(line)) offences.push(`${relative(coreDir, file)}:${i + 1}: ${line.trim()}`);
          }
        });
    }
    expect(offences, offences.join('\n')).toEqual([]);
  });
});
