import type { CommandIo } from '../main';

export async function analyzeCommand(_args: string[], io: CommandIo): Promise<number> {
  io.stderr('jigwright analyze: not built yet\n');
  return 2;
}
