import type { Cooler } from '@/shared/api/coolers';
import { quantity } from '@/components/screens/runs/run-format';
import { formatNumber } from '@/components/format/number';
import { FactList, type Fact } from '@/components/ui/fact-list';
import { coolerGoal, coolerKindLabel, heatFlow } from './cooler-format';
import { coolerLegWords, stageSourceWords, useSourceNames, type SourceNames } from './source-names';

/** A saved cooler's setup as labelled values, in trade units; what a run of it computes. */
export function coolerFacts(cooler: Pick<Cooler, 'kind' | 'input'>, names: SourceNames): Fact[] {
  const i = cooler.input;
  const facts: Fact[] = [
    { key: 'kind', label: 'Kind', value: coolerKindLabel[i.kind] },
    { key: 'objective', label: 'Objective', value: coolerGoal(i) },
    { key: 'hotSide', label: 'Heat sink Th', value: quantity(i.hotSide, 'K') },
  ];
  if (i.kind === 'cascade') {
    facts.push({ key: 'heatLoad', label: 'Heat load on the coldest stage', value: heatFlow(i.heatLoad ?? 0) });
    if (i.coldSide !== undefined) facts.push({ key: 'coldSide', label: 'Cold-side target Tc', value: quantity(i.coldSide, 'K') });
    facts.push({ key: 'wiring', label: 'Wiring', value: i.wiring === 'separate' ? 'One supply per stage' : 'All stages in series on one supply' });
    const limit = i.couplesLimit ?? null;
    facts.push({ key: 'counts', label: 'Couple counts', value: limit === null ? 'As given per stage' : limit.kind === 'total' ? `Optimised within ${limit.total} couples in all` : `Optimised within a base area of ${quantity(limit.baseAreaMm2, 'mm²')}` });
    i.stages.forEach((s, k) =>
      facts.push({ key: `stage-${k + 1}`, label: `Stage ${k + 1}${k === 0 ? ' (coldest)' : ''}`, value: `${s.couples} couples · ${stageSourceWords(s.source, names)} · interface ${quantity(s.interfaceResistance ?? 0, 'K/W')}` }),
    );
  } else {
    facts.push({ key: 'p', label: 'p-type leg', value: coolerLegWords(i.p, names) });
    facts.push({ key: 'n', label: 'n-type leg', value: coolerLegWords(i.n, names) });
    if ((i.objective ?? 'maxDeltaT') === 'maxDeltaT') facts.push({ key: 'heatLoad', label: 'Heat load per couple', value: heatFlow(i.heatLoad ?? 0) });
    if (i.coldSide !== undefined) facts.push({ key: 'coldSide', label: 'Cold-side target Tc', value: quantity(i.coldSide, 'K') });
    facts.push({ key: 'areaRatio', label: 'Area ratio A_n / A_p', value: i.areaRatio === undefined ? 'Optimised (total cross-section kept)' : formatNumber(i.areaRatio, 4) });
  }
  facts.push({ key: 'starts', label: 'Search starts', value: String(i.starts ?? (i.kind === 'cascade' ? 4 : 8)) });
  return facts;
}

export function CoolerFacts({ cooler, testID = 'cooler-facts' }: { cooler: Pick<Cooler, 'kind' | 'input'>; testID?: string }) {
  const names = useSourceNames();
  return <FactList facts={coolerFacts(cooler, names)} label="Setup" testID={testID} />;
}
