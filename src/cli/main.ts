/**
 * The command line's entry (run with tsx: `npm run cli -- <command> …`). Each command lives in
 * its own file and is listed here; a command is a function of its arguments and an io object,
 * returning the exit code.
 */
import { readFileSync } from 'node:fs';
import { loggerCommand, LOGGER_USAGE, type CommandIo } from './logger-command.ts';

const commands: Record<string, { run: (argv: readonly string[], io: CommandIo) => number; usage: string }> = {
  logger: { run: loggerCommand, usage: LOGGER_USAGE },
};

const io: CommandIo = {
  readFile: (path) => readFileSync(path),
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
};

const [name, ...rest] = process.argv.slice(2);
const command = name === undefined ? undefined : commands[name];
if (!command) {
  io.stderr(`${name ? `Unknown command "${name}". ` : ''}Commands:\n${Object.values(commands).map((c) => `  ${c.usage}`).join('\n')}\n`);
  process.exitCode = 1;
} else {
  process.exitCode = command.run(rest, io);
}
