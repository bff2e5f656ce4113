/**
 * The commands of the command line, in the order the help lists them. A new command is
 * a file beside this one exporting a Command (cli/command.ts), added to this list.
 */
import type { Command } from '../command.js';
import { areas } from './areas.js';
import { bonjean } from './bonjean.js';
import { check } from './check.js';
import { crossCurvesCommand } from './crossCurves.js';
import { float } from './float.js';
import { gz } from './gz.js';
import { hydrostatics } from './hydrostatics.js';
import { plot } from './plot.js';
import { report } from './report.js';
import { sheet } from './sheet.js';

export const COMMANDS: readonly Command[] = [hydrostatics, sheet, bonjean, areas, float, crossCurvesCommand, gz, check, plot, report];

export function findCommand(name: string): Command | undefined {
  return COMMANDS.find((c) => c.name === name);
}
