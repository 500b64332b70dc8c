import type { CommandIo } from '../main';

export async function cutlistCommand(_args: string[], io: CommandIo): Promise<number> {
  io.stderr('jigwright cutlist: not built yet\n');
  return 2;
}
