import type { CutList } from './cut-list';

const HEAD = [
  'material',
  'stock',
  'thickness_mm',
  'part',
  'quantity',
  'finished_length_mm',
  'finished_width_mm',
  'finished_thickness_mm',
  'rough_length_mm',
  'rough_width_mm',
  'rough_thickness_mm',
  'board_feet',
  'finished_in',
  'rough_in',
  'grain',
];

/** The cut list as CSV (RFC 4180: comma separated, CRLF line ends, quotes doubled inside quoted fields). */
export function cutListCsv(cutList: CutList): string {
  const lines = [HEAD];
  for (const group of cutList.groups) {
    for (const row of group.rows) {
      lines.push([
        group.material,
        group.stock,
        mm(group.thickness),
        row.name,
        String(row.quantity),
        mm(row.finished.length),
        mm(row.finished.width),
        mm(row.finished.thickness),
        mm(row.rough.length),
        mm(row.rough.width),
        mm(row.rough.thickness),
        row.boardFeet === null ? '' : row.boardFeet.toFixed(2),
        row.inches.finished,
        row.inches.rough,
        row.grain,
      ]);
    }
  }
  return lines.map((fields) => fields.map(csvField).join(',')).join('\r\n') + '\r\n';
}

function mm(value: number): string {
  return String(Math.round(value * 100) / 100);
}

function csvField(text: string): string {
  return /[",\r\n]/.test(text) || /^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
