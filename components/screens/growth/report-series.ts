import type { ReportView, SheetZone } from '@/shared/api/growth-documents';
import type { PlotPoint } from '@/components/charts/line-plot-types';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks, colors } from '@/components/theme';
import { isOutside } from './reading-words';

/**
 * A step line through the zones: flat across each zone, a vertical jump at
 * each boundary. The plot merges points by x, so the jump's lower corner
 * sits a hair (10⁻⁵ of the leg) before the boundary.
 */
export function zoneSteps(rows: SheetZone[], value: (z: SheetZone) => number, lengthMm: number): PlotPoint[] {
  const hair = lengthMm * 1e-5;
  return rows.flatMap((z, i) => [
    { x: z.startMm, y: value(z) },
    { x: i === rows.length - 1 ? z.endMm : z.endMm - hair, y: value(z) },
  ]);
}

/**
 * Target steps, the tolerance band's edges, the doping inferred at each
 * measured position, and — with a marker of their own, drawn on top — the
 * positions with a reading outside their zone's band (a position's doping
 * can sit inside the band while its S and σ each lie outside it).
 */
export function reportSeries(rows: SheetZone[], report: ReportView, lengthMm: number): PlotSeries[] {
  const grown = [...report.points].sort((a, b) => a.positionMm - b.positionMm).map((p) => ({ x: p.positionMm, y: p.perCm3 }));
  const outside = report.points.filter(isOutside).sort((a, b) => a.positionMm - b.positionMm).map((p) => ({ x: p.positionMm, y: p.perCm3 }));
  const bandMark = chartMarks[1];
  return [
    { key: 'target', label: 'Target', mark: chartMarks[0], line: zoneSteps(rows, (z) => z.perCm3, lengthMm) },
    { key: 'band-high', label: 'Band, high edge', mark: bandMark, line: zoneSteps(rows, (z) => z.highPerCm3, lengthMm) },
    { key: 'band-low', label: 'Band, low edge', mark: { ...bandMark, dash: 'dotted' }, line: zoneSteps(rows, (z) => z.lowPerCm3, lengthMm) },
    { key: 'grown', label: 'As grown (inferred)', mark: chartMarks[2], line: grown, points: grown },
    ...(outside.length > 0 ? [{ key: 'outside', label: 'Reading outside its band', mark: { color: colors.danger, dash: 'solid', marker: 'square' } as const, line: [], points: outside }] : []),
  ];
}
