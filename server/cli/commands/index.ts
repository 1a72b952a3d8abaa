import type { Command } from 'commander';
import { registerCutlist } from './cutlist.ts';
import { registerEmc } from './emc.ts';
import { registerFit } from './fit.ts';
import { registerFloat } from './float.ts';
import { registerLayout } from './layout.ts';
import { registerMovement } from './movement.ts';
import { registerPlan } from './plan.ts';

/** A command registers itself (name, options, action) on the program. */
export type RegisterCommand = (program: Command) => void;

/** Every command of the command line, in the order `--help` lists them. */
export const commands: RegisterCommand[] = [registerEmc, registerMovement, registerFloat, registerCutlist, registerPlan, registerFit, registerLayout];
