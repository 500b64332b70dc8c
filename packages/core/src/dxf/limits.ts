/** Bounds on the work one drawing may cause; each one can be raised or lowered by the caller. */
export interface DrawingLimits {
  /** Largest drawing text accepted, in characters (≈ bytes for ASCII DXF). */
  maxFileSize: number;
  /** Most entities parsed, model space and block definitions together. */
  maxEntities: number;
  /** Deepest chain of blocks inserted inside blocks. */
  maxBlockDepth: number;
  /** Most entities after every insert and array cell is expanded. */
  maxExpandedEntities: number;
  /** Longest analysis after parsing, in milliseconds. */
  maxTimeMs: number;
}

export const DEFAULT_DRAWING_LIMITS: DrawingLimits = {
  maxFileSize: 64 * 1024 * 1024,
  maxEntities: 1_000_000,
  maxBlockDepth: 32,
  maxExpandedEntities: 2_000_000,
  maxTimeMs: 30_000,
};
