import type { CommandIo } from '../main';

export async function jointCommand(_args: string[], io: CommandIo): Promise<number> {
  io.stderr('jigwright joint: not built yet\n');
  return 2;
}
