import type { CascadeRunResult } from '@/shared/api/coolers';
import { formatNumber } from '@/components/format/number';
import { DataTable, type DataColumn } from '@/components/ui/data-table';

type StageRow = CascadeRunResult['stages'][number] & { number: number };

/** Heat flows in mW when every one is under a watt (a detector stage), else in W. */
export function heatUnit(watts: readonly number[]): { unit: 'mW' | 'W'; factor: number } {
  return watts.every((w) => Math.abs(w) < 1) ? { unit: 'mW', factor: 1000 } : { unit: 'W', factor: 1 };
}

function columns(r: CascadeRunResult): DataColumn<StageRow>[] {
  const load = heatUnit(r.stages.map((s) => s.heatLoad));
  const rejected = heatUnit(r.stages.map((s) => s.heatRejected));
  const n = (v: number, digits = 4) => formatNumber(v, digits);
  return [
    { key: 'stage', head: 'Stage', unit: '1 = coldest', width: 96, phoneWidth: 84, cell: (s) => String(s.number) },
    { key: 'coldSide', head: 'Cold side', unit: 'K', width: 96, phoneWidth: 84, mono: true, cell: (s) => n(s.coldSide) },
    { key: 'hotSide', head: 'Hot side', unit: 'K', width: 96, phoneWidth: 84, mono: true, cell: (s) => n(s.hotSide) },
    { key: 'current', head: 'Current', unit: 'A', width: 96, phoneWidth: 84, mono: true, cell: (s) => n(s.current) },
    { key: 'voltage', head: 'Voltage', unit: 'V', width: 96, phoneWidth: 84, mono: true, cell: (s) => n(s.voltage) },
    { key: 'power', head: 'Power', unit: 'W', width: 96, phoneWidth: 84, mono: true, cell: (s) => n(s.power) },
    { key: 'heatLoad', head: 'Heat load', unit: load.unit, width: 104, phoneWidth: 92, mono: true, cell: (s) => n(s.heatLoad * load.factor) },
    { key: 'heatRejected', head: 'Heat rejected', unit: rejected.unit, width: 120, phoneWidth: 104, mono: true, cell: (s) => n(s.heatRejected * rejected.factor) },
    { key: 'couples', head: 'Couples', unit: 'N', width: 88, phoneWidth: 80, mono: true, grow: 1, cell: (s) => String(s.couples) },
  ];
}

/**
 * Each stage's temperatures, current, voltage, power and heat flows,
 * coldest first. The heat one stage rejects is the load of the stage under
 * it. On a phone it scrolls inside its card, the stage number held.
 */
export function StageTable({ result }: { result: CascadeRunResult }) {
  const rows = result.stages.map((s, i) => ({ ...s, number: i + 1 }));
  return <DataTable label="Stages of the cascade, coldest first" testID="stage-table" columns={columns(result)} rows={rows} rowKey={(s) => String(s.number)} rowTestID={(s) => `stage-row-${s.number}`} />;
}
