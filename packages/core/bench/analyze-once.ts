// Child process of the benchmark: analyses one file in a fresh process and reports its memory.
// Run under `node --trace-gc`, whose lines give the heap in use just before each collection;
// the largest of those is the peak heap. The idle figures are taken before the file is read, so
// the text itself counts towards the analysis.
import { readFileSync } from 'node:fs';
import { analyzeDrawing } from '../src/analysis/analyze-drawing';

const file = process.argv[2];
if (!file) throw new Error('name a DXF file');
const idle = process.memoryUsage();
const analysis = analyzeDrawing(readFileSync(file, 'utf8'));
process.stdout.write(
  `\nRESULT ${JSON.stringify({
    parts: analysis.parts.length,
    maxRssKb: process.resourceUsage().maxRSS,
    idleRssKb: idle.rss / 1024,
    idleHeapKb: idle.heapUsed / 1024,
  })}\n`,
);
