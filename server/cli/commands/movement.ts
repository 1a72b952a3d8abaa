/**
 * `casewright movement --species white-oak --width 15in --from-mc 8 --to-mc 12
 * [--sawn flat|quarter|unknown] [--json]`: the change in width of a solid-wood part
 * between two moisture contents (WH2010 Eq. 13-2, Table 13-5).
 */
import { dual } from '../../../shared/units/dual.ts';
import { SAWN_VALUES, widthChange, type Sawn } from '../../../shared/wood/movement.ts';
import { getSpecies } from '../../../shared/wood/species.ts';
import { choiceOption, lengthOption, percentOption, printJson, printLines } from '../options.ts';
import type { RegisterCommand } from './index.ts';

const SAWN_WORDS: Record<Sawn, string> = {
  flat: 'flat-sawn',
  quarter: 'quarter-sawn',
  unknown: 'sawing unknown (the larger movement assumed)',
};

interface MovementOptions {
  species?: string;
  width?: string;
  fromMc?: string;
  toMc?: string;
  sawn?: string;
  json?: boolean;
}

export const registerMovement: RegisterCommand = (program) => {
  program
    .command('movement')
    .description('Change in width of a solid-wood part between two moisture contents.')
    .requiredOption('--species <id>', 'species id, e.g. white-oak')
    .requiredOption('--width <length>', 'width across the grain, e.g. 15in, 14 1/2", 380mm')
    .requiredOption('--from-mc <percent>', 'starting moisture content, %')
    .requiredOption('--to-mc <percent>', 'final moisture content, %')
    .option('--sawn <how>', 'flat, quarter or unknown (unknown takes the larger movement)', 'unknown')
    .option('--json', 'print JSON only')
    .action((options: MovementOptions) => {
      const species = getSpecies(options.species ?? '', '--species');
      const widthMm = lengthOption(options.width, '--width');
      const fromMcPercent = percentOption(options.fromMc, '--from-mc', { min: 0, max: 30 });
      const toMcPercent = percentOption(options.toMc, '--to-mc', { min: 0, max: 30 });
      const sawn = choiceOption(options.sawn, '--sawn', SAWN_VALUES, 'unknown');
      const change = widthChange({ widthMm, species, sawn, fromMcPercent, toMcPercent });
      const width = dual(widthMm);

      if (options.json) {
        return printJson({
          species: species.id,
          speciesName: species.name,
          sawn,
          direction: change.direction,
          widthMm: width.mm,
          widthIn: width.in,
          fromMcPercent,
          toMcPercent,
          coefficient: change.coefficient,
          method: change.method,
          withinPublishedRange: change.withinPublishedRange,
          approximate: change.approximate,
          changeMm: change.change.mm,
          changeIn: change.change.in,
          text: change.change.text,
          ...(change.note !== undefined ? { note: change.note } : {}),
          source: species.source.coefficients,
        });
      }
      const wider = change.changeMm > 0 ? 'wider' : change.changeMm < 0 ? 'narrower' : 'no change';
      const lines = [
        `${species.name}, ${width.text.in} (${width.text.mm}) wide, ${SAWN_WORDS[sawn]}: ${change.direction} coefficient ${change.coefficient.toFixed(5)} per 1 % MC, ${species.source.coefficients.ref}`,
        `${fromMcPercent} % → ${toMcPercent} % moisture content: ${change.change.text.in} (${change.change.text.mm}) ${wider}${change.approximate ? ' — approximate' : ''}`,
      ];
      if (change.note) lines.push(change.note);
      printLines(lines);
    });
};
