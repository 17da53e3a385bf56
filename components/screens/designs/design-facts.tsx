import type { Design } from '@/shared/api/designs';
import { designEndsWords } from '@/components/format/leg-ends-words';
import { withUnit } from '@/components/format/number';
import { FactList, type Fact } from '@/components/ui/fact-list';
import { doping, objectiveInfo, quantity } from '../runs/run-format';
import { designFieldInfo } from './design-fields';

const carrierWords = { p: 'p-type', n: 'n-type' } as const;

function facts(d: Design): Fact[] {
  const f = designFieldInfo;
  const rows: Fact[] = [
    { key: 'family', label: f.familyId.label, value: `${d.familyName} · version ${d.familyVersion}${d.carrier ? ` · ${carrierWords[d.carrier]}` : ''}` },
    { key: 'objective', label: f.objective.label, value: objectiveInfo[d.objective].goal },
    { key: 'lengthMm', label: f.lengthMm.label, value: quantity(d.lengthMm, 'mm') },
    { key: 'areaMm2', label: f.areaMm2.label, value: quantity(d.areaMm2, 'mm²') },
    { key: 'hotSide', label: f.hotSide.label, value: quantity(d.hotSide, 'K') },
  ];
  if (d.objective !== 'maxHeatLoad') rows.push({ key: 'heatLoad', label: f.heatLoad.label, value: quantity(d.heatLoad, 'W') });
  if (d.objective !== 'maxDeltaT') rows.push({ key: 'coldSide', label: f.coldSide.label, value: quantity(d.coldSide, 'K') });
  rows.push(
    { key: 'doping', label: 'Doping bounds', value: `${doping(d.minPerCm3)} to ${doping(d.maxPerCm3)}` },
    { key: 'controlPoints', label: f.controlPoints.label, value: `${d.controlPoints}${d.monotone ? ', monotone' : ', free shape'}` },
    { key: 'starts', label: f.starts.label, value: withUnit(String(d.starts), 'starts') },
    { key: 'minZoneMm', label: f.minZoneMm.label, value: quantity(d.minZoneMm, 'mm') },
    { key: 'ends', label: 'Contacts and parasitic heat', value: designEndsWords(d) },
  );
  return rows;
}

/** A design's numbers in trade units, one line each. */
export function DesignFacts({ design, testID = 'design-facts' }: { design: Design; testID?: string }) {
  return <FactList facts={facts(design)} label="Design" testID={testID} />;
}
