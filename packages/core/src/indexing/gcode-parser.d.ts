// gcode-parser ships no types; only what the export tests use.
declare module 'gcode-parser' {
  export type GcodeWord = [letter: string, value: number | string];
  export interface GcodeLine {
    line: string;
    words: GcodeWord[];
    comments?: string[];
  }
  export function parseStringSync(text: string): GcodeLine[];
}
