import type { EngineCommand } from './types';
import { groundCommand } from './ground';
import { climateCommand } from './climate';
import { assessCommand } from './assess';

export const engineCommands: Record<string, EngineCommand> = {
  ground: groundCommand as EngineCommand,
  climate: climateCommand as EngineCommand,
  assess: assessCommand as EngineCommand,
};
