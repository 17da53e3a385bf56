import { LinePlot } from '@/components/charts/line-plot';
import type { PlotPoint } from '@/components/charts/line-plot-types';
import { Section } from '@/components/ui/form-section';

const samplePoints: PlotPoint[] = Array.from({ length: 25 }, (_, i) => {
  const x = i / 24;
  return { x, y: 1 - Math.exp(-3 * x) };
});

/** A client-side check: can this browser draw Frostgrade's charts? */
export function ChartCheck() {
  return (
    <Section title="Charts" hint="A sample curve drawn with the chart engine. If you can see it, plots will work in this browser.">
      <LinePlot
        points={samplePoints}
        xLabel="sample x (no unit)"
        yLabel="sample y (no unit)"
        description="Sample curve rising from 0 towards 1, drawn to check that charts work"
        height={180}
      />
    </Section>
  );
}
