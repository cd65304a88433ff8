/**
 * The `logger` command: run in-process on an invented file, and as a real process on a file it
 * cannot read (exit 2 with a message naming the file and the problem).
 */
import { describe, it, expect } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLoggerCommand } from '../../src/cli/logger-command.ts';
import type { CommandIo } from '../../src/cli/command-io.ts';
import { parseArguments } from '../../src/cli/arguments.ts';
import { schoolRoom, writeLoggerFile } from '../support/logger-records.ts';

const DAY0 = Date.UTC(2024, 10, 4) / 1000;
const text = writeLoggerFile(
  schoolRoom({ start_s: DAY0, days: 2, step_s: 60, volume_m3: 120, people: 25, occupiedSupply_m3s: 0.07, emptySupply_m3s: 0.015, seed: 9 }),
  { delimiter: ';', decimalComma: true, preamble: ['Invented export'], writing: 'day-first', zone: 'Europe/London' },
);

async function run(argv: string[], files: Record<string, string> = { 'room.csv': text }) {
  let out = '';
  let err = '';
  const bytes = async (path: string) => {
    if (!(path in files)) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
    return new TextEncoder().encode(files[path]);
  };
  const io: CommandIo = {
    readBytes: bytes,
    readFile: async (path) => new TextDecoder().decode(await bytes(path)),
    writeFile: async () => {},
    out: (t) => (out += t),
    err: (line) => (err += `${line}\n`),
  };
  const code = await runLoggerCommand(argv, io);
  return { code, out, err };
}

describe('logger command in-process', () => {
  it('prints the layout, columns, time format and periods', async () => {
    const r = await run(['room.csv', '--volume', '120', '--outdoor', '420', '--tz', 'Europe/London']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('Layout: delimiter ";", decimal mark ","');
    expect(r.out).toMatch(/CO2 \(ppm\)\s+co2/);
    expect(r.out).toContain('day-first dates');
    expect(r.out).toContain('keeps the readings on consecutive days');
    expect(r.out).toMatch(/decay\s+2024-11-04 12:0\d/);
    expect(r.out).toMatch(/L\/s/);
  });

  it('prints JSON with --json', async () => {
    const r = await run(['room.csv', '--json', '--volume=120', '--tz', 'Europe/London']);
    expect(r.code).toBe(0);
    const json = JSON.parse(r.out);
    expect(json.report.delimiter).toBe(';');
    expect(json.readings.count).toBe(2880);
    expect(json.periods.some((p: { kind: string }) => p.kind === 'decay')).toBe(true);
  });

  it('exits 2 for bad arguments and for a file it cannot read', async () => {
    expect((await run(['room.csv', '--volume', 'big'])).code).toBe(2);
    expect((await run(['room.csv', '--colour'])).err).toContain('Unknown option --colour');
    const missing = await run(['nope.csv']);
    expect(missing).toMatchObject({ code: 2, err: 'Cannot read nope.csv: no such file.\n' });
    const prose = await run(['notes.txt'], { 'notes.txt': 'Dear landlord,\nthe vents are shut.\n' });
    expect(prose.code).toBe(2);
    expect(prose.err).toMatch(/^Cannot read notes.txt: No line of the file splits/);
    const ambiguous = await run(['a.csv'], { 'a.csv': 'Time,CO2\n05/06/2024 10:00,800\n05/06/2024 10:01,801\n' });
    expect(ambiguous.code).toBe(2);
    expect(ambiguous.err).toContain('--date-order');
  });

  it('parses arguments of our own shape', () => {
    expect(parseArguments(['f', '--json', '--tz=UTC'], { flags: ['json'], options: ['tz'] })).toMatchObject({ ok: true, positional: ['f'], options: new Map([['tz', 'UTC']]) });
    expect(parseArguments(['--tz'], { flags: [], options: ['tz'] })).toEqual({ ok: false, message: '--tz needs a value.' });
  });
});

describe('logger command as a process', () => {
  it('exits 2 with a clear message for a file it cannot read', () => {
    const dir = mkdtempSync(join(tmpdir(), 'ventwalk-cli-'));
    const bad = join(dir, 'photo.jpg');
    writeFileSync(bad, Uint8Array.of(0xff, 0xd8, 0xff, 0xe0, 0, 0x10, 0x4a, 0x46, 0x49, 0x46, 0, 1, 0, 0, 0, 0));
    const root = new URL('../../', import.meta.url).pathname;
    const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'logger', bad], { cwd: root, encoding: 'utf8', timeout: 60_000 });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`Cannot read ${bad}: The file holds binary data, not text`);
  }, 60_000);
});
