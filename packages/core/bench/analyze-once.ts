// Child process of the benchmark: analyses one file and reports its peak resident memory, so that
// each figure comes from a fresh process.
import { readFileSync } from 'node:fs';
import { analyzeDrawing } from '../src/analysis/analyze-drawing';

const file = process.argv[2];
if (!file) throw new Error('name a DXF file');
const analysis = analyzeDrawing(readFileSync(file, 'utf8'));
process.stdout.write(JSON.stringify({ parts: analysis.parts.length, maxRssKb: process.resourceUsage().maxRSS }));
