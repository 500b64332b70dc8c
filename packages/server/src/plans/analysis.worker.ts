import { analyzeDrawing, DEFAULT_DRAWING_LIMITS, type DrawingAnalysis, type DrawingUnits } from '@jigwright/core';

export interface AnalysisTask {
  text: string;
  units?: DrawingUnits;
}

/** Errors lose their class on the way back from a worker thread, so the outcome says which it was. */
export type AnalysisOutcome = { ok: true; analysis: DrawingAnalysis } | { ok: false; message: string };

/** Runs in a worker thread of the analysis pool (drawing-analysis.service.ts). */
export default function analyse(task: AnalysisTask): AnalysisOutcome {
  try {
    return {
      ok: true,
      analysis: analyzeDrawing(task.text, {
        limits: DEFAULT_DRAWING_LIMITS,
        ...(task.units ? { units: task.units } : {}),
      }),
    };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
}
