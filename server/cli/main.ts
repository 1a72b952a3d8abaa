/**
 * The `casewright` command line: `npm run -s casewright -- <command> [options]`.
 * Each command lives in `commands/<name>.ts` and registers itself on the program.
 * Errors go to stderr with exit code 2 (bad input) or 1 (anything else); `--json`
 * output goes to stdout alone.
 */
import { Command, CommanderError } from 'commander';
import { isInputError } from '../../shared/errors.ts';
import { commands } from './commands/index.ts';

export function buildProgram(): Command {
  const program = new Command('casewright')
    .description('Casewright: design case furniture from the command line.')
    .exitOverride()
    .configureOutput({ writeErr: (text) => process.stderr.write(text) });
  for (const register of commands) register(program);
  return program;
}

export async function runCli(argv: string[]): Promise<number> {
  const program = buildProgram();
  try {
    await program.parseAsync(argv, { from: 'user' });
    return 0;
  } catch (error) {
    if (error instanceof CommanderError) {
      // --help and --version end here with exit code 0.
      return error.exitCode === 0 ? 0 : 2;
    }
    if (isInputError(error)) {
      process.stderr.write(`casewright: ${error.field}: ${error.message}\n`);
      return 2;
    }
    process.stderr.write(`casewright: ${error instanceof Error ? error.message : String(error)}\n`);
    return 1;
  }
}

const isMain = import.meta.url === `file://${process.argv[1]}`;
if (isMain) {
  runCli(process.argv.slice(2)).then((code) => {
    process.exitCode = code;
  });
}
