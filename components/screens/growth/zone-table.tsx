import type { SheetZone } from '@/shared/api/growth-documents';
import { useIsWide } from '@/components/shell/use-is-wide';
import { DataTable, type DataColumn } from '@/components/ui/data-table';
import { formatNumber } from '@/components/format/number';
import { bandEdges, microVoltPerK, mm, perCm3, rangeText, siemensPerCm, zoneName } from './growth-format';

export type ZoneTableProps = { rows: SheetZone[]; measureTemperature: number; lossBudget: number };

type Zone = { zone: SheetZone; last: boolean };

/** The columns after the zone itself; widths are the least each needs, spare width shared like the old flex weights. */
function quantities(t: number, budget: number): DataColumn<Zone>[] {
  return [
    { key: 'position', head: 'From – to', width: 96, grow: 1.25, cell: ({ zone: z }) => ({ main: `${formatNumber(z.startMm, 3)}–${mm(z.endMm)}`, sub: `${mm(z.endMm - z.startMm)} long` }) },
    { key: 'target', head: 'Target n', width: 104, grow: 1.35, cell: ({ zone: z }) => ({ main: perCm3(z.perCm3) }) },
    { key: 'band', head: `Band n (loss ≤ ${budget} K)`, width: 120, grow: 1.5, cell: ({ zone: z }) => ({ main: `${bandEdges(z).low} –\n${bandEdges(z).high} cm⁻³` }) },
    { key: 'seebeck', head: `S at ${t} K`, width: 92, grow: 1.15, cell: ({ zone: z }) => ({ main: microVoltPerK(z.seebeckUvK), sub: `band ${rangeText(z.seebeckBandUvK, 'µV/K')}` }) },
    { key: 'sigma', head: `σ at ${t} K`, width: 96, grow: 1.2, cell: ({ zone: z }) => ({ main: siemensPerCm(z.sigmaSCm), sub: `band ${rangeText(z.sigmaBandSCm, 'S/cm')}` }) },
  ];
}

const endWords = ({ zone: z, last }: Zone) => (z.index === 0 ? 'cold end' : last ? 'hot end' : '');

/** Wide and on paper the zone is a narrow first column; a phone's card is titled "Zone 1 · cold end". */
const zoneColumn = (wide: boolean): DataColumn<Zone> =>
  wide
    ? { key: 'zone', head: 'Zone', width: 56, grow: 0.6, cell: (r) => ({ main: String(r.zone.index + 1), sub: endWords(r) }) }
    : { key: 'zone', head: 'Zone', width: 0, cell: (r) => [zoneName(r.zone.index), endWords(r)].filter(Boolean).join(' · ') };

/**
 * The zones the grower makes, cold end first: where each starts and ends,
 * its target carrier concentration, the band that keeps the ΔT loss under
 * the budget, and what S and σ should read at the check temperature. A
 * table on wide screens and on paper, one card per zone on a phone.
 */
export function ZoneTable({ rows, measureTemperature, lossBudget }: ZoneTableProps) {
  const wide = useIsWide();
  const columns = [zoneColumn(wide), ...quantities(measureTemperature, lossBudget)];
  const zones = rows.map((zone, i) => ({ zone, last: i === rows.length - 1 }));
  return (
    <DataTable
      label="Zones"
      testID="zone-table"
      phone="cards"
      columns={columns}
      rows={zones}
      rowKey={(r) => String(r.zone.index)}
      rowTestID={(r) => `zone-row-${r.zone.index + 1}`}
    />
  );
}
