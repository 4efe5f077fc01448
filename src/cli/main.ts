import { parseArgs } from 'node:util';
import { commands } from './commands';
import { InputError } from './errors';

function usage(): string {
  const lines = Object.values(commands).map((c) => `  ${c.usage.padEnd(58)} ${c.summary}`);
  return `usage: npm run cli -- <command> …\n\n${lines.join('\n')}\n`;
}

/** Runs one CLI invocation and returns its exit code: 0 done, 2 invalid input, 1 anything else. */
export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h') {
    process.stdout.write(usage());
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    process.stderr.write(`unknown command "${name}"\n${usage()}`);
    return 2;
  }
  try {
    let parsed;
    try {
      parsed = parseArgs({ args: rest, options: command.options, allowPositionals: true, strict: true });
    } catch (error) {
      throw new InputError([`${(error as Error).message}; usage: ${command.usage}`]);
    }
    return await command.run({ positionals: parsed.positionals, values: parsed.values as Record<string, string | boolean | undefined> });
  } catch (error) {
    if (error instanceof InputError) {
      process.stderr.write(`${error.lines.join('\n')}\n`);
      return 2;
    }
    process.stderr.write(`${name} failed: ${error instanceof Error ? error.message : String(error)}\n`);
    return 1;
  }
}

process.exitCode = await main(process.argv.slice(2));
