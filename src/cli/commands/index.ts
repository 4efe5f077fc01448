import { compute } from './compute';
import { grid } from './grid';
import { spectrum } from './spectrum';
import { sweep } from './sweep';
import { breakeven } from './breakeven';
import type { CliCommand } from './types';

/** Every CLI command by name; a new command is one file and one line here. */
export const commands: Record<string, CliCommand> = {
  compute,
  grid,
  spectrum,
  sweep,
  breakeven,
};
