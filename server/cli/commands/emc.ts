/**
 * `casewright emc --temp 70F --rh 50 [--json]`: the moisture content wood settles at in that
 * air (WH2010 Eq. 4-5). With `--mc 8` instead of `--rh`, the humidity that gives it.
 */
import { InputError } from '../../../shared/errors.ts';
import { roundTo } from '../../../shared/units/format.ts';
import { emcPercent, humidityForEmc, toFahrenheit } from '../../../shared/wood/emc.ts';
import { percentOption, printJson, printLines, temperatureOption } from '../options.ts';
import type { RegisterCommand } from './index.ts';

const SOURCE = 'WH2010 Eq. 4-5 (Hailwood-Horrobin), USDA FPL-GTR-190';

interface EmcOptions {
  temp?: string;
  rh?: string;
  mc?: string;
  json?: boolean;
}

export const registerEmc: RegisterCommand = (program) => {
  program
    .command('emc')
    .description('Equilibrium moisture content of wood from air temperature and relative humidity (or the humidity for a moisture content).')
    .requiredOption('--temp <temperature>', 'dry-bulb temperature with its unit, e.g. 70F or 21C')
    .option('--rh <percent>', 'relative humidity, %')
    .option('--mc <percent>', 'target moisture content, % (gives the relative humidity instead)')
    .option('--json', 'print JSON only')
    .action((options: EmcOptions) => {
      const { temperature, temperatureUnit } = temperatureOption(options.temp, '--temp');
      const temperatureF = roundTo(toFahrenheit(temperature, temperatureUnit), 0.1);
      const temperatureC = roundTo(temperatureUnit === 'C' ? temperature : ((temperature - 32) * 5) / 9, 0.1);
      if ((options.rh === undefined) === (options.mc === undefined)) {
        throw new InputError('--rh', 'give exactly one of --rh (for the moisture content) or --mc (for the humidity)', 'one of --rh, --mc');
      }

      let relativeHumidityPercent: number;
      let emc: number;
      if (options.rh !== undefined) {
        relativeHumidityPercent = percentOption(options.rh, '--rh');
        emc = emcPercent({ temperature, temperatureUnit, relativeHumidityPercent });
      } else {
        emc = percentOption(options.mc, '--mc', { min: 0, max: 30 });
        relativeHumidityPercent = humidityForEmc({ temperature, temperatureUnit, emcPercent: emc });
      }

      const result = {
        temperature,
        temperatureUnit,
        temperatureF,
        temperatureC,
        relativeHumidityPercent: roundTo(relativeHumidityPercent, 0.01),
        emcPercent: roundTo(emc, 0.01),
        solvedFor: options.rh !== undefined ? 'emcPercent' : 'relativeHumidityPercent',
        source: SOURCE,
      };
      if (options.json) return printJson(result);
      const air = `${temperatureF} °F (${temperatureC} °C)`;
      printLines(
        options.rh !== undefined
          ? [`Equilibrium moisture content at ${air} and ${result.relativeHumidityPercent} % RH: ${roundTo(emc, 0.1).toFixed(1)} %`, `Source: ${SOURCE}`]
          : [`Relative humidity for ${result.emcPercent} % moisture content at ${air}: ${roundTo(relativeHumidityPercent, 1).toFixed(0)} %`, `Source: ${SOURCE}`],
      );
    });
};
