#!/usr/bin/env node
// The basinquota command line: the only shell around the pure core. Commands load lazily, so --help is instant.
import { parseArgs } from 'node:util';
import * as msg from './messages.js';

const log = (line: string): void => {
  process.stderr.write(`${line}\n`);
};

/** Run one command line; resolves to the exit code. */
export async function main(argv: string[]): Promise<number> {
  const [command, ...rest] = argv;
  if (!command || command === '--help' || command === '-h' || command === 'help') {
    process.stdout.write(msg.usage());
    return command ? 0 : 2;
  }
  let parsed;
  try {
    parsed = parseArgs({ args: rest, allowPositionals: true, options: { out: { type: 'string' }, config: { type: 'string' }, port: { type: 'string' }, help: { type: 'boolean', short: 'h' } } });
  } catch (error) {
    log(error instanceof Error ? error.message : String(error));
    return 2;
  }
  const { values, positionals } = parsed;
  if (values.help) {
    process.stdout.write(msg.commandHelp[command] ?? msg.usage());
    return 0;
  }
  switch (command) {
    case 'init':
      if (positionals.length !== 1) {
        process.stderr.write(msg.commandHelp.init);
        return 2;
      }
      return (await import('./init-project.js')).initProject(positionals[0], log);
    case 'check':
      return (await import('./check-project.js')).checkProject(positionals[0] ?? '.', values.config, log);
    case 'build':
      return (await (await import('./build-project.js')).buildProject({ dir: positionals[0] ?? '.', config: values.config, out: values.out, log })).code;
    case 'diff':
      if (positionals.length < 2 || positionals.length > 3) {
        log((await import('../version/index.js')).versionMessages.diffUsage());
        return 2;
      }
      return (await import('./diff-command.js')).diffCommand(positionals[2] ?? '.', positionals[0], positionals[1], log);
    case 'serve': {
      const port = values.port === undefined ? 8080 : Number(values.port);
      if (!Number.isInteger(port) || port < 0 || port > 65535) {
        log(msg.badPort(values.port ?? ''));
        return 2;
      }
      return (await import('./serve-command.js')).serveCommand(positionals[0] ?? '.', { port, config: values.config, out: values.out }, log);
    }
    case 'demo':
      return (await import('./demo-command.js')).demoCommand(values.out, log);
    default:
      log(msg.unknownCommand(command));
      return 2;
  }
}

const isEntry = process.argv[1] && /main\.(ts|js)$/.test(process.argv[1]);
if (isEntry) {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (error: unknown) => {
      log(`internal error: ${error instanceof Error ? error.message : String(error)}`);
      process.exitCode = 3;
    },
  );
}
