import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import mysql from 'mysql2/promise';
import { ROOT } from '../../../infra/config.ts';

/** The fixed word lists the product uses (kept equal to the server's vocabulary.ts by its spec). */
interface Vocabulary {
  categories: string[];
  tools: Array<{ id: string; power: boolean }>;
  licences: Array<{ id: string }>;
}

export interface DatabaseEnv {
  DB_HOST: string;
  DB_PORT: string;
  DB_NAME: string;
  DB_USER: string;
  DB_PASSWORD: string;
}

export interface GeneratedLibrary {
  plans: number;
  revisions: number;
  parts: number;
  seconds: number;
}

// Invented words for invented plans: nothing here names a real person, shop or product.
const FIRST_NAMES =
  'Ada Bram Cora Dov Elin Fenn Greta Hugo Ines Joss Kira Lars Mina Nils Oona Pim Quill Rhea Sten Tove Ulla Vik Wren Yara Zeb'.split(
    ' ',
  );
const SHOP_WORDS = 'Alder Birch Cedar Elm Hazel Larch Maple Rowan Spruce Walnut Ash Yew Oak Pine Linden'.split(' ');
const SHOP_KINDS = 'Workshop Joinery Bench Shed Loft Barn Garage Mill'.split(' ');
const ADJECTIVES =
  'compact adjustable heavy-duty featherweight precise quick-set folding wall-hung stackable two-way long-reach low-profile'.split(
    ' ',
  );
const NOUNS: Record<string, string[]> = {
  sled: ['crosscut sled', 'panel sled', 'miter sled', 'tenon sled'],
  fence: ['rip fence', 'router fence', 'sacrificial fence', 'tall fence'],
  'taper-jig': ['taper jig', 'leg taper jig', 'wedge jig'],
  'circle-jig': ['circle jig', 'trammel jig', 'disc cutter'],
  'drilling-guide': ['drilling guide', 'dowel guide', 'shelf-pin guide', 'pocket guide'],
  'router-jig': ['mortise jig', 'dado jig', 'flattening jig', 'inlay template'],
  'indexing-jig': ['lead-screw indexer', 'finger-joint indexer', 'box-joint carriage', 'stepper indexer'],
  clamping: ['clamp rack', 'panel press', 'glue-up caul set', 'edge clamp'],
  sharpening: ['honing guide', 'grinder rest', 'strop stand', 'plane-iron holder'],
  other: ['stop block', 'outfeed roller', 'featherboard', 'push block'],
};
const TAGS =
  'plywood hardwood mdf t-track stop-block dust-port knobs toggle-clamp stepper lead-screw arduino finger-joint box-joint tenon dado rabbet miter bevel shop-made beginner repeatable'.split(
    ' ',
  );
const NOTE_SENTENCES = [
  'Cut the base from flat plywood and check it with a straightedge before gluing anything to it.',
  'Square the fence to the blade with a five-cut test and shim the runner until the error is under a tenth of a millimetre.',
  'Wax the runners so that the carriage glides in the miter slot without play.',
  'Drill the knob holes on the drill press so that the threaded inserts sit plumb.',
  'The stepper driver needs its current set before the first run; a cool motor misses steps.',
  'Mark the zero position on the rail and home the carriage against the switch each time.',
  'Keep the dust port in line with the cutter, or chips pack under the stop block.',
  'Glue the cleats with the grain running the long way and let the panel rest overnight.',
  'A hardwood runner moves with the seasons; a plastic one keeps its size.',
  'Test the finger spacing on scrap until the joint closes with hand pressure.',
  'Round over the handle edges so the grip stays comfortable through a long session.',
  'Fit the toggle clamps last, once the workpiece stops are where you want them.',
];
const MATERIALS = ['Birch plywood 18 mm', 'Birch plywood 12 mm', 'MDF 18 mm', 'Maple', 'Oak', 'HDPE'];
const PART_NAMES = ['Base', 'Fence', 'Runner', 'Stop block', 'Carriage', 'Cleat', 'Handle', 'Brace', 'Rail', 'Arm'];

/** A small deterministic generator (mulberry32), so every run builds the same library. */
function random(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function rectangle(x: number, y: number, length: number, width: number): [number, number][] {
  return [
    [x, y],
    [x + length, y],
    [x + length, y + width],
    [x, y + width],
  ];
}

const capitalised = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
const slugOf = (text: string) =>
  text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');

/**
 * Writes `count` published plans with their owners, tools, revisions, drawings and parts straight
 * into a freshly migrated database, in multi-row INSERTs: what the publishing path would have left
 * there, without its tens of thousands of requests. The drawings rows have no stored file and no
 * analysis (the library never reads them); everything the library reads is filled in as publishing
 * fills it.
 */
export async function generateLibrary(env: DatabaseEnv, count: number): Promise<GeneratedLibrary> {
  const started = Date.now();
  const vocabulary = JSON.parse(readFileSync(join(ROOT, 'plans-seed/vocabulary.json'), 'utf8')) as Vocabulary;
  const categories = vocabulary.categories.map((word) => word.replace(/\s+/g, '-'));
  const next = random(20261202);
  const pick = <T,>(items: readonly T[]): T => items[Math.floor(next() * items.length)]!;
  const some = <T,>(items: readonly T[], min: number, max: number): T[] => {
    const wanted = min + Math.floor(next() * (max - min + 1));
    return [...new Set(Array.from({ length: wanted }, () => pick(items)))];
  };
  const connection = await mysql.createConnection({
    host: env.DB_HOST,
    port: Number(env.DB_PORT),
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
    timezone: 'Z',
    charset: 'utf8mb4_unicode_ci',
  });
  const insert = async (table: string, columns: string[], rows: unknown[][]) => {
    for (let from = 0; from < rows.length; from += 500) {
      await connection.query(`INSERT INTO \`${table}\` (${columns.map((c) => `\`${c}\``).join(', ')}) VALUES ?`, [
        rows.slice(from, from + 500),
      ]);
    }
  };

  try {
    const designers = 300;
    await insert(
      'members',
      ['id', 'github_id', 'login', 'display_name', 'email'],
      Array.from({ length: designers }, (_, i) => {
        const name = `${FIRST_NAMES[i % FIRST_NAMES.length]} of ${pick(SHOP_WORDS)} ${pick(SHOP_KINDS)}`;
        return [i + 1, 900_000_000 + i, `bench-designer-${i + 1}`, name, `bench-designer-${i + 1}@bench.example`];
      }),
    );

    const plans: unknown[][] = [];
    const tools: unknown[][] = [];
    const revisions: unknown[][] = [];
    const drawings: unknown[][] = [];
    const parts: unknown[][] = [];
    const now = Date.now();
    for (let i = 0; i < count; i++) {
      const id = i + 1;
      const category = pick(categories);
      const title = capitalised(`${pick(ADJECTIVES)} ${pick(NOUNS[category] ?? NOUNS.other!)}`);
      const tags = some(TAGS, 2, 4);
      const needed = some(vocabulary.tools, 1, 4);
      const motorised = category === 'indexing-jig' ? next() < 0.8 : next() < 0.05;
      const latest = next() < 0.3 ? 2 : 1;
      const rated = next() < 0.6;
      const ratingCount = rated ? 1 + Math.floor(next() * 80) : 0;
      const publishedAt = new Date(now - Math.floor(next() * 3 * 365 * 86_400_000));
      const notes = some(NOTE_SENTENCES, 3, 7).join(' ');

      const outlines: [number, number][][] = [];
      let x = 0;
      const revisionParts = Array.from({ length: 3 + Math.floor(next() * 6) }, (_, position) => {
        const length = 100 + Math.round(next() * 700);
        const width = 40 + Math.round(next() * 300);
        outlines.push(rectangle(x, 0, length, width));
        x += length + 20;
        return { position, length, width, name: PART_NAMES[position % PART_NAMES.length]!, material: pick(MATERIALS) };
      });
      const height = Math.max(...revisionParts.map((part) => part.width));

      plans.push([
        id,
        `${slugOf(title)}-${id}`,
        1 + (i % designers),
        title,
        `A ${title.toLowerCase()} for the ${category.replace(/-/g, ' ')} corner of the shop, built from ${pick(MATERIALS).toLowerCase()}.`,
        category,
        JSON.stringify(tags),
        tags.join(' '),
        pick(vocabulary.licences).id,
        motorised,
        latest,
        publishedAt,
        notes,
        JSON.stringify({ extents: { min: [0, 0], max: [x - 20, height] }, outlines }),
        rated ? (1 + next() * 4).toFixed(2) : '0.00',
        ratingCount,
        next() < 0.6 ? Math.floor(next() * 40) : 0,
      ]);
      for (const tool of needed) tools.push([id, tool.id]);
      for (let number = 1; number <= latest; number++) {
        const revisionId = revisions.length + 1;
        revisions.push([
          revisionId,
          id,
          number,
          'published',
          number === 1 ? '' : 'Longer fence and a second stop block.',
          number === latest ? notes : some(NOTE_SENTENCES, 3, 5).join(' '),
          needed.some((tool) => tool.power) || motorised
            ? 'Keep the blade guard on, use a push stick, and unplug the saw before changing the jig.'
            : '',
          JSON.stringify([{ item: 'Wood screw', specification: '4 × 30 mm', quantity: 12, note: '' }]),
          new Date(publishedAt.getTime() - (latest - number) * 30 * 86_400_000),
        ]);
        drawings.push([
          revisionId,
          revisionId,
          `plans/${id}/revisions/${revisionId}/drawings/bench`,
          `${slugOf(title)}-r${number}.dxf`,
          20_000 + Math.floor(next() * 200_000),
          randomBytes(32).toString('hex'),
          'done',
          revisionParts.length * 4,
        ]);
        for (const part of revisionParts) {
          parts.push([
            revisionId,
            revisionId,
            part.position,
            part.name,
            1 + Math.floor(next() * 2),
            part.length,
            part.width,
            18,
            part.material,
            part.material.startsWith('Birch') || part.material.startsWith('MDF') ? 'sheet' : 'solid',
            'any',
            JSON.stringify({ points: rectangle(0, 0, part.length, part.width), holes: [] }),
          ]);
        }
      }
    }

    await insert(
      'plans',
      [
        'id',
        'slug',
        'owner_id',
        'title',
        'summary',
        'category',
        'tags',
        'tags_text',
        'licence',
        'motorised',
        'latest_published_number',
        'latest_published_at',
        'search_notes',
        'thumbnail',
        'rating_average',
        'rating_count',
        'build_count',
      ],
      plans,
    );
    await insert('plan_tools', ['plan_id', 'tool'], tools);
    await insert(
      'revisions',
      ['id', 'plan_id', 'number', 'state', 'changelog', 'notes', 'safety_notes', 'hardware', 'published_at'],
      revisions,
    );
    await insert(
      'drawings',
      ['id', 'revision_id', 'storage_key', 'original_name', 'size', 'sha256', 'status', 'entity_count'],
      drawings,
    );
    await insert(
      'parts',
      [
        'revision_id',
        'drawing_id',
        'position',
        'name',
        'quantity',
        'length',
        'width',
        'thickness',
        'material',
        'stock_kind',
        'grain',
        'outline',
      ],
      parts,
    );
    // What InnoDB's background statistics would reach on its own after so many new rows.
    await connection.query('ANALYZE TABLE `plans`, `plan_tools`, `revisions`, `drawings`, `parts`');
    return { plans: count, revisions: revisions.length, parts: parts.length, seconds: (Date.now() - started) / 1000 };
  } finally {
    await connection.end();
  }
}
