/**
 * The analyse and report commands run in-process on the demo file and on bad files: exit codes,
 * output, the files written, and the app's import messages for a bad survey.
 */
import { describe, expect, it } from 'vitest';
import { runAnalyseCommand } from '../../src/cli/analyse-command.ts';
import type { CommandIo } from '../../src/cli/command-io.ts';
import { runReportCommand } from '../../src/cli/report-command.ts';
import { demoFile, fixtureText } from '../support/fixtures.ts';
import { pdfPages } from '../support/pdf-text.ts';

function fakeIo(files: Record<string, string>) {
  const out: string[] = [];
  const err: string[] = [];
  const written = new Map<string, Uint8Array | string>();
  const io: CommandIo = {
    out: (s) => out.push(s),
    err: (s) => err.push(s),
    readFile: async (path) => {
      if (!(path in files)) throw new Error(`ENOENT: no such file, open '${path}'`);
      return files[path]!;
    },
    readBytes: async (path) => new TextEncoder().encode(await io.readFile(path)),
    writeFile: async (path, data) => void written.set(path, data),
  };
  return { io, out, err, written };
}

const DEMO = { 'demo.json': fixtureText('demo-survey.json') };

describe('analyse', () => {
  it('prints a table per survey of the demo file', async () => {
    const { io, out, err } = fakeIo(DEMO);
    expect(await runAnalyseCommand(['demo.json', '--draws', '50'], io)).toBe(0);
    const text = out.join('');
    for (const s of demoFile().surveys) expect(text).toContain(s.survey.title);
    expect(text).toContain('Classroom B1 (B.G.04)');
    expect(text).toMatch(/Outdoor air L\/s/);
    expect(err).toEqual([]);
  });

  it('prints per-room JSON with --json', async () => {
    const { io, out } = fakeIo(DEMO);
    expect(await runAnalyseCommand(['demo.json', '--json', '--draws', '50'], io)).toBe(0);
    const json = JSON.parse(out.join(''));
    expect(json[0].surveys).toHaveLength(3);
    expect(json[0].surveys[0].rooms[0]).toMatchObject({ name: 'Classroom B1', headline: { supply_m3s: { basis: 'measured' } } });
  });

  it('exits 2 with the import’s messages for a bad survey, a missing file or no arguments', async () => {
    const bad = demoFile();
    bad.surveys[0]!.survey.title = '';
    const { io, err } = fakeIo({ 'bad.json': JSON.stringify(bad), 'junk.json': '{"format": "something"' });
    expect(await runAnalyseCommand(['bad.json'], io)).toBe(2);
    expect(err).toContain('bad.json: surveys.0.survey.title: Survey title is empty: give the survey a name (found "")');
    expect(await runAnalyseCommand(['junk.json'], io)).toBe(2);
    expect(err.join('\n')).toMatch(/junk\.json: This is not a complete JSON file/);
    expect(await runAnalyseCommand(['missing.json'], io)).toBe(2);
    expect(err.join('\n')).toMatch(/missing\.json: the file could not be read/);
    expect(await runAnalyseCommand([], io)).toBe(2);
    expect(err.at(-1)).toMatch(/^usage: analyse/);
  });
});

describe('report', () => {
  it('writes one PDF and CSV per survey of the demo file, the same bytes for the same issue date', async () => {
    const { io, written, out } = fakeIo(DEMO);
    const args = ['demo.json', '--out', 'out/report.pdf', '--csv', 'out/rooms.csv', '--issue-date', '2026-01-22', '--draws', '50'];
    expect(await runReportCommand(args, io)).toBe(0);
    expect([...written.keys()].sort()).toEqual(['out/report-1.pdf', 'out/report-2.pdf', 'out/report-3.pdf', 'out/rooms-1.csv', 'out/rooms-2.csv', 'out/rooms-3.csv']);
    expect(out.join('')).toContain('out/report-2.pdf: report of "Damp and mould inspection, flats 3 and 7 (demo, invented)", 4 rooms');
    const pages = await pdfPages(written.get('out/report-2.pdf') as Uint8Array);
    expect(pages.join('\n')).toContain('Calder Rise Housing Co-operative (invented)');
    expect(String(written.get('out/rooms-2.csv'))).toMatch(/^rank,place,/);
    const again = fakeIo(DEMO);
    expect(await runReportCommand(['demo.json', '--out', 'r.pdf', '--survey', '2', '--issue-date', '2026-01-22', '--draws', '50'], again.io)).toBe(0);
    expect(Buffer.from(again.written.get('r.pdf') as Uint8Array).equals(Buffer.from(written.get('out/report-2.pdf') as Uint8Array))).toBe(true);
  });

  it('exits 2 on bad arguments and bad files', async () => {
    const { io, err } = fakeIo(DEMO);
    expect(await runReportCommand(['demo.json'], io)).toBe(2);
    expect(err).toContain('--out <file.pdf> is needed.');
    expect(await runReportCommand(['demo.json', '--out', 'x.pdf', '--survey', '7'], io)).toBe(2);
    expect(err.at(-1)).toBe('demo.json: holds 3 surveys; --survey 7 is not one of them');
    expect(await runReportCommand(['demo.json', '--out', 'x.pdf', '--issue-date', 'soon'], io)).toBe(2);
    expect(await runReportCommand(['nothing.json', '--out', 'x.pdf'], io)).toBe(2);
  });
});
