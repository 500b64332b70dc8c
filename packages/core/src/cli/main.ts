import { analyzeCommand } from './commands/analyze';
import { cutlistCommand } from './commands/cutlist';
import { jointCommand } from './commands/joint';

export type Command = (args: string[], io: CommandIo) => Promise<number>;

export interface CommandIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
}

const commands: Record<string, Command> = {
  analyze: analyzeCommand,
  cutlist: cutlistCommand,
  joint: jointCommand,
};

const usage = `Usage: jigwright <command> [options]

Commands:
  analyze FILE.dxf   measure the parts of a drawing
  cutlist FILE.dxf   derive the cut list, sheet layouts and bar plans of a drawing
  joint              lay out a finger joint and the indexing moves of a lead-screw jig

Run "jigwright <command> --help" for a command's options.
`;

export async function main(argv: string[], io: CommandIo = defaultIo): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h') {
    io.stdout(usage);
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    io.stderr(`jigwright: unknown command "${name}"\n${usage}`);
    return 2;
  }
  return command(rest, io);
}

const defaultIo: CommandIo = {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
};
