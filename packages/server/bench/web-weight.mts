import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
}

export interface WebWeight {
  files: Array<{ file: string; bytes: number; gzipped: number }>;
  gzipped: number;
  /** Files among them that hold three.js (its renderer class is in every build of it). */
  withThree: string[];
}

/** The library page's route module, as the router imports it lazily (packages/web/src/app/router.tsx). */
const LIBRARY_ROUTE = 'src/app/routes/library.tsx';

/**
 * The JavaScript a first visit to the library page loads: the entry chunk, the library route's
 * chunk and every chunk they import statically, each gzipped (zlib's default level, as a web
 * server compresses). Lazy imports are left out: they load only when something asks for them.
 */
export function libraryPageWeight(webDist: string): WebWeight {
  const manifestFile = join(webDist, '.vite/manifest.json');
  if (!existsSync(manifestFile)) throw new Error(`${manifestFile} is missing: build the web app (npm run build).`);
  const manifest = JSON.parse(readFileSync(manifestFile, 'utf8')) as Record<string, ManifestChunk>;
  const entry = Object.keys(manifest).find((key) => manifest[key]!.isEntry);
  if (!entry) throw new Error('The Vite manifest names no entry chunk.');
  if (!manifest[LIBRARY_ROUTE]) throw new Error(`The Vite manifest has no chunk for ${LIBRARY_ROUTE}.`);
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const imported of manifest[key]?.imports ?? []) visit(imported);
  };
  visit(entry);
  visit(LIBRARY_ROUTE);
  const files = [...seen]
    .map((key) => manifest[key]!.file)
    .filter((file) => file.endsWith('.js'))
    .map((file) => {
      const bytes = readFileSync(join(webDist, file));
      return { file, bytes: bytes.length, gzipped: gzipSync(bytes).length, three: bytes.includes('WebGLRenderer') };
    });
  return {
    files: files.map(({ file, bytes, gzipped }) => ({ file, bytes, gzipped })),
    gzipped: files.reduce((sum, file) => sum + file.gzipped, 0),
    withThree: files.filter((file) => file.three).map((file) => file.file),
  };
}
