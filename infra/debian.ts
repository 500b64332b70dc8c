import { existsSync } from 'node:fs';
import { run, type Log } from './process.ts';

/**
 * Installs Debian packages when a program is missing: as root directly, otherwise through sudo;
 * when neither is possible, stops with the one command to run.
 */
export async function ensureDebianPackages(
  what: string,
  programs: string[],
  packages: string[],
  log: Log,
): Promise<string> {
  const found = programs.find((path) => existsSync(path));
  if (found) return found;
  const command = `apt-get update && apt-get install -y ${packages.join(' ')}`;
  const asRoot = process.getuid?.() === 0;
  const canSudo =
    !asRoot &&
    (await run('sudo', ['-n', 'true']).then(
      () => true,
      () => false,
    ));
  if (!asRoot && !canSudo) {
    throw new Error(
      `${what} is not installed and this user cannot install packages. Run once:\n  sudo sh -c '${command}'`,
    );
  }
  log(`Installing ${what} from Debian packages (first run only)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const apt = (args: string[]) =>
    asRoot
      ? run('apt-get', args, { env })
      : run('sudo', ['-n', '--preserve-env=DEBIAN_FRONTEND', 'apt-get', ...args], { env });
  await apt(['update']);
  await apt(['install', '-y', '--no-install-recommends', ...packages]);
  const installed = programs.find((path) => existsSync(path));
  if (!installed) throw new Error(`apt-get finished but ${what} was not found. Try: ${command}`);
  return installed;
}
