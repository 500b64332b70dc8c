import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { DEMO_PLAN_DRAWINGS, demoDrawingPath } from './demo-plans';
import { FIXTURE_DRAWINGS } from './fixtures';
import { largeDrawing } from './large';

const USAGE = `Usage:
  tsx tools/drawings/cli.ts fixtures OUTDIR      write the golden drawings as OUTDIR/<name>.dxf
  tsx tools/drawings/cli.ts large N OUTFILE      write a drawing of about N entities
  tsx tools/drawings/cli.ts demo-plans OUTDIR    write the demo plans' drawings as OUTDIR/<slug>/r<N>/<name>.dxf
`;

function main(argv: string[]): number {
  const [command, ...rest] = argv;
  if (command === 'fixtures' && rest[0]) {
    mkdirSync(rest[0], { recursive: true });
    for (const [name, draw] of Object.entries(FIXTURE_DRAWINGS))
      writeFileSync(path.join(rest[0], `${name}.dxf`), draw());
    return 0;
  }
  if (command === 'demo-plans' && rest[0]) {
    for (const drawing of DEMO_PLAN_DRAWINGS) {
      const file = path.join(rest[0], demoDrawingPath(drawing));
      mkdirSync(path.dirname(file), { recursive: true });
      writeFileSync(file, drawing.draw());
    }
    return 0;
  }
  if (command === 'large' && rest[0] && rest[1] && Number(rest[0]) > 0) {
    writeFileSync(rest[1], largeDrawing(Number(rest[0])));
    return 0;
  }
  process.stderr.write(USAGE);
  return 2;
}

process.exit(main(process.argv.slice(2)));
