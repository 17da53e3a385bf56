import { screen, within } from '@testing-library/react-native';
import { formatNumber, formatScientific } from '@/components/format/number';
import { useIsWide } from '@/components/shell/use-is-wide';
import { renderWithProviders } from '@/components/test-utils';
import { threeZones } from './test-fixtures';
import { ZoneTable } from './zone-table';

jest.mock('@/components/shell/use-is-wide', () => ({ useIsWide: jest.fn(() => false) }));
const wideMock = useIsWide as jest.MockedFunction<typeof useIsWide>;

/** "3.1 × 10¹⁹" → a pattern that survives the thin spaces around units. */
const sci = (v: number) => formatScientific(v, 3).replace(/[.×]/g, (c) => `\\${c}`);

describe.each([
  ['a phone (one card per zone)', false],
  ['a wide screen and paper (a table)', true],
])('ZoneTable on %s', (_label, wide) => {
  beforeEach(() => wideMock.mockReturnValue(wide));

  it('gives every zone its position, target, band and room-temperature checks, each with its unit', () => {
    renderWithProviders(<ZoneTable rows={threeZones} measureTemperature={300} lossBudget={1} />);
    expect(screen.getByTestId('zone-table')).toHaveTextContent(/S at 300 K[\s\S]*σ at 300 K/);
    for (const z of threeZones) {
      const row = within(screen.getByTestId(`zone-row-${z.index + 1}`));
      expect(row.getByText(`${formatNumber(z.startMm, 3)}–${formatNumber(z.endMm, 3)}\u202fmm`)).toBeOnTheScreen();
      expect(row.getByText(new RegExp(`^${sci(z.perCm3)}\\s?cm⁻³$`))).toBeOnTheScreen();
      expect(row.getByText(new RegExp(`^${formatNumber(z.seebeckUvK, 3)}\\s?µV/K$`))).toBeOnTheScreen();
      expect(row.getByText(new RegExp(`^${formatNumber(z.sigmaSCm, 3)}\\s?S/cm$`))).toBeOnTheScreen();
      const [sLow, sHigh] = [...z.seebeckBandUvK].sort((a, b) => a - b);
      expect(row.getByText(`band ${formatNumber(sLow, 3)}–${formatNumber(sHigh, 3)}\u202fµV/K`)).toBeOnTheScreen();
    }
  });

  it('marks a band edge that reached the design limit, and only that one', () => {
    renderWithProviders(<ZoneTable rows={threeZones} measureTemperature={300} lossBudget={1} />);
    const bounded = threeZones.filter((z) => z.highAtBound || z.lowAtBound);
    expect(bounded).toHaveLength(1);
    const first = within(screen.getByTestId(`zone-row-${bounded[0].index + 1}`));
    expect(first.getByText(new RegExp(`≥ ${sci(bounded[0].highPerCm3)} \\(bound\\)`))).toBeOnTheScreen();
    for (const z of threeZones.filter((r) => !r.highAtBound && !r.lowAtBound)) {
      expect(within(screen.getByTestId(`zone-row-${z.index + 1}`)).queryByText(/bound\)/)).toBeNull();
    }
  });

  it('names the cold end and the hot end', () => {
    renderWithProviders(<ZoneTable rows={threeZones} measureTemperature={300} lossBudget={1} />);
    expect(screen.getByTestId('zone-row-1')).toHaveTextContent(/cold end/);
    expect(screen.getByTestId(`zone-row-${threeZones.length}`)).toHaveTextContent(/hot end/);
  });
});
