import type { ParseArgsConfig } from 'node:util';

/** What a command receives after the shared argument parsing. */
export interface CliArgs {
  positionals: string[];
  values: Record<string, string | boolean | undefined>;
}

/** One sub-command of the CLI. `run` returns the exit code; InputError means exit 2. */
export interface CliCommand {
  usage: string;
  summary: string;
  options: NonNullable<ParseArgsConfig['options']>;
  run(args: CliArgs): number | Promise<number>;
}
