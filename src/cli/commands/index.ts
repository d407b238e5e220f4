/** Registry of subcommands: name → function that adds it to the program. One file per command. */
import type { Command } from 'commander';
import { registerBuild } from './build.js';
import { registerInspect } from './inspect.js';
import { registerNewman } from './newman.js';
import { registerChair } from './chair.js';
import { registerBatch } from './batch.js';
import { registerEnsemble } from './ensemble.js';
import { registerTrajectory } from './trajectory.js';
import { registerDemo } from './demo.js';
import { registerExplore } from './explore.js';

export type RegisterCommand = (program: Command) => void;

export const COMMANDS = new Map<string, RegisterCommand>([
  ['inspect', registerInspect],
  ['newman', registerNewman],
  ['build', registerBuild],
  ['chair', registerChair],
  ['batch', registerBatch],
  ['ensemble', registerEnsemble],
  ['trajectory', registerTrajectory],
  ['explore', registerExplore],
  ['demo', registerDemo],
]);
