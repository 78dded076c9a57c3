export interface LineSpec {
  key: string;
  name: string;
  color: string;
  /** drawn dashed; named "dashed" in the legend and in instructions, so nothing depends on colour */
  dashed?: boolean;
  /** drawn dotted; named "dotted" */
  dotted?: boolean;
}

export interface RefLine {
  x?: number;
  y?: number;
  label: string;
  color?: string;
}

/** A stretch of the x axis to shade and name, e.g. points of a sweep that are not buildable. */
export interface Band {
  x1: number;
  x2: number;
  label: string;
}

/** How a line is drawn, in words: what the legend and every instruction use instead of its colour. */
export function lineStyleName(l: LineSpec): string {
  return l.dashed ? 'dashed' : l.dotted ? 'dotted' : 'solid';
}

export const dashOf = (l: LineSpec) => (l.dashed ? '7 4' : l.dotted ? '2 3' : undefined);


/** What every chart draws: rows of numbers, the column on the x axis, the axis names and the series. */
export type ChartSeries = {
  data: ReadonlyArray<Record<string, number | null>>;
  xKey: string;
  xLabel: string;
  yLabel: string;
  lines: LineSpec[];
};
