import type { DrawingLimits } from './limits';

export type DrawingErrorCode = 'empty' | 'binary' | 'not-dxf' | 'truncated' | 'unreadable' | 'block-cycle' | 'limit';

/** Why a drawing could not be analysed; the message is one line, fit for a person to read. */
export class DrawingError extends Error {
  readonly code: DrawingErrorCode;
  /** 1-based line of the DXF text where the problem was found, when known. */
  readonly line: number | undefined;

  constructor(code: DrawingErrorCode, message: string, line?: number) {
    super(line === undefined ? message : `${message} (line ${line})`);
    this.name = 'DrawingError';
    this.code = code;
    this.line = line;
  }
}

/** A drawing asked for more work than a limit allows. */
export class DrawingLimitError extends DrawingError {
  readonly limit: keyof DrawingLimits;
  readonly max: number;

  constructor(limit: keyof DrawingLimits, max: number, detail: string) {
    super('limit', `drawing exceeds the ${limit} limit of ${max}: ${detail}`);
    this.name = 'DrawingLimitError';
    this.limit = limit;
    this.max = max;
  }
}
