/**
 * `casewright float --species black-cherry --panel-width 14in --groove-depth 3/8in
 * --build-mc 7 --low-mc 5 --high-mc 11 [--json]`: the gap a captured panel needs at each side
 * and whether its groove holds it through the seasons.
 */
import { InputError } from '../../../shared/errors.ts';
import { dual } from '../../../shared/units/dual.ts';
import { checkClimate, getClimatePreset, DEFAULT_CLIMATE, CLIMATE_PRESET_IDS } from '../../../shared/wood/climate.ts';
import { panelFloat } from '../../../shared/wood/float.ts';
import { SAWN_VALUES } from '../../../shared/wood/movement.ts';
import { resolveMaterial } from '../../../shared/wood/resolve.ts';
import { choiceOption, lengthOption, percentOption, printJson, printLines } from '../options.ts';
import type { RegisterCommand } from './index.ts';

interface FloatOptions {
  species?: string;
  panelWidth?: string;
  grooveDepth?: string;
  minEngagement?: string;
  buildMc?: string;
  lowMc?: string;
  highMc?: string;
  climate?: string;
  sawn?: string;
  json?: boolean;
}

const MC = { min: 0, max: 30 };

const OPTION_FOR_FIELD: Record<string, string> = {
  'climate.buildMcPercent': '--build-mc',
  'climate.lowMcPercent': '--low-mc',
  'climate.highMcPercent': '--high-mc',
};

// The engine names climate fields; the maker typed options, so the error names those.
function withOptionNames<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    const option = error instanceof InputError ? OPTION_FOR_FIELD[error.field] : undefined;
    if (error instanceof InputError && option) throw new InputError(option, error.message, error.limit);
    throw error;
  }
}

export const registerFloat: RegisterCommand = (program) => {
  program
    .command('float')
    .description('Gap each side for a panel in grooves, and a check that the groove holds it from the driest to the most humid season.')
    .requiredOption('--species <id>', 'species id, a sheet good id, or plywood / mdf')
    .requiredOption('--panel-width <length>', 'panel width across the grain, tongues included, e.g. 14in')
    .requiredOption('--groove-depth <length>', 'groove depth each side, e.g. 3/8in')
    .option('--min-engagement <length>', 'least tongue to keep in each groove at the driest (default half the groove depth)')
    .option('--build-mc <percent>', 'moisture content when built, %')
    .option('--low-mc <percent>', 'moisture content in the driest season, %')
    .option('--high-mc <percent>', 'moisture content in the most humid season, %')
    .option('--climate <preset>', `regional preset for any moisture content not given: ${CLIMATE_PRESET_IDS.join(', ')}`, DEFAULT_CLIMATE.id)
    .option('--sawn <how>', 'flat, quarter or unknown (unknown takes the larger movement)', 'unknown')
    .option('--json', 'print JSON only')
    .action((options: FloatOptions) => {
      const material = resolveMaterial(options.species ?? '', '--species');
      const panelWidthMm = lengthOption(options.panelWidth, '--panel-width');
      const grooveDepthMm = lengthOption(options.grooveDepth, '--groove-depth');
      const minEngagementMm = options.minEngagement === undefined ? undefined : lengthOption(options.minEngagement, '--min-engagement', { allowZero: true });
      const preset = getClimatePreset(options.climate ?? DEFAULT_CLIMATE.id, '--climate');
      const custom = [options.buildMc, options.lowMc, options.highMc].some((value) => value !== undefined);
      const climate = withOptionNames(() => checkClimate(
        {
          buildMcPercent: options.buildMc === undefined ? preset.buildMcPercent : percentOption(options.buildMc, '--build-mc', MC),
          lowMcPercent: options.lowMc === undefined ? preset.lowMcPercent : percentOption(options.lowMc, '--low-mc', MC),
          highMcPercent: options.highMc === undefined ? preset.highMcPercent : percentOption(options.highMc, '--high-mc', MC),
          label: custom ? 'custom' : preset.label,
        },
        'climate',
      ));
      const sawn = choiceOption(options.sawn, '--sawn', SAWN_VALUES, 'unknown');
      const float = panelFloat({
        panelWidthMm,
        material: material.kind === 'solid' ? material.species : (material.sheetGood ?? 'plywood'),
        sawn,
        grooveDepthMm,
        climate,
        ...(minEngagementMm !== undefined ? { tongueEngagementMinMm: minEngagementMm } : {}),
      });

      const swing = float.movement;
      const both = (valueMm: number) => dual(valueMm, { inchPrecision: 32, mmPrecision: 0.1 });
      const width = both(panelWidthMm);
      const groove = both(grooveDepthMm);
      const gap = float.gapEachSide;
      const atBuild = both(float.engagementAtBuildMm);
      const atDriest = float.engagementAtDriest;
      const least = both(float.engagementMinMm);
      const swell = both(swing?.swellMm ?? 0);
      const shrink = both(swing?.shrinkMm ?? 0);
      const total = both(swing?.totalMm ?? 0);

      if (options.json) {
        return printJson({
          material: float.material,
          sawn: float.material.kind === 'solid' ? sawn : null,
          climate,
          panelWidthMm: width.mm,
          panelWidthIn: width.in,
          grooveDepthMm: groove.mm,
          grooveDepthIn: groove.in,
          gapEachSideMm: gap.mm,
          gapEachSideIn: gap.in,
          swellMm: swell.mm,
          swellIn: swell.in,
          shrinkMm: shrink.mm,
          shrinkIn: shrink.in,
          totalMovementMm: total.mm,
          totalMovementIn: total.in,
          engagementAtBuildMm: atBuild.mm,
          engagementAtBuildIn: atBuild.in,
          engagementAtDriestMm: atDriest.mm,
          engagementAtDriestIn: atDriest.in,
          engagementMinMm: least.mm,
          engagementMinIn: least.in,
          withinPublishedRange: swing?.withinPublishedRange ?? true,
          approximate: swing?.approximate ?? false,
          ok: float.check.ok,
          shortfallMm: float.check.shortfall.mm,
          shortfallIn: float.check.shortfall.in,
          fix: float.check.fix,
          message: float.check.message,
          notes: float.notes,
        });
      }
      const lines = [
        `${float.material.name} panel ${width.text.in} (${width.text.mm}) wide in grooves ${groove.text.in} (${groove.text.mm}) deep`,
        `Moisture content: built at ${climate.buildMcPercent} %, driest ${climate.lowMcPercent} %, most humid ${climate.highMcPercent} %${custom ? '' : ` — ${preset.label}`}`,
        swing
          ? `Movement: shrinks ${shrink.text.in} (${shrink.text.mm}), swells ${swell.text.in} (${swell.text.mm}); ${total.text.in} (${total.text.mm}) in all`
          : 'Movement: negligible (sheet good)',
        `Gap each side at build: ${gap.text.in} (${gap.text.mm})`,
        `Tongue in each groove: ${atBuild.text.in} (${atBuild.text.mm}) at build, ${atDriest.text.in} (${atDriest.text.mm}) at the driest; least allowed ${least.text.in} (${least.text.mm})`,
        `Check: ${float.check.message}`,
      ];
      if (!float.check.ok) lines.push(`Fix: ${float.check.fix}`);
      for (const note of float.notes) lines.push(`Note: ${note}`);
      printLines(lines);
    });
};
