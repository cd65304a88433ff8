/**
 * The command line's entry (run with tsx: `npm run cli -- <command> …`). Each command lives in
 * its own file and is listed here; a command is a function of its arguments and an io object,
 * returning the exit code (0 done, 2 bad input, 1 internal error).
 */
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { runAnalyseCommand, ANALYSE_USAGE } from './analyse-command.ts';
import { EXIT, type CommandIo } from './command-io.ts';
import { runLoggerCommand, LOGGER_USAGE } from './logger-command.ts';
import { runReportCommand, REPORT_USAGE } from './report-command.ts';

const commands: Record<string, { run: (argv: string[], io: CommandIo) => Promise<number>; usage: string }> = {
  analyse: { run: runAnalyseCommand, usage: ANALYSE_USAGE },
  report: { run: runReportCommand, usage: REPORT_USAGE },
  logger: { run: runLoggerCommand, usage: LOGGER_USAGE },
};

const io: CommandIo = {
  out: (s) => process.stdout.write(s),
  err: (line) => process.stderr.write(`${line}\n`),
  readFile: (path) => readFile(path, 'utf8'),
  readBytes: async (path) => new Uint8Array(await readFile(path)),
  writeFile: async (path, data) => {
    await mkdir(dirname(path), { recursive: true });
    await writeFile(path, data);
  },
};

const [name, ...rest] = process.argv.slice(2);
const command = name === undefined ? undefined : commands[name];
if (!command) {
  io.err(`${name ? `Unknown command "${name}". ` : ''}Commands:\n${Object.values(commands).map((c) => `  ${c.usage}`).join('\n')}`);
  process.exitCode = EXIT.badInput;
} else {
  try {
    process.exitCode = await command.run(rest, io);
  } catch (error) {
    io.err(`Internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    process.exitCode = EXIT.internal;
  }
}
