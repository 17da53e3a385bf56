import { screen, within } from '@testing-library/react-native';
import { legsFromRun } from '@/shared/engine';
import { renderWithProviders } from '@/components/test-utils';
import { parseRunResult } from '@/components/screens/runs/run-result';
import { pBand, runDetail } from '@/components/screens/runs/test-fixtures';
import { resultLegs } from '@/components/screens/curves/curve-model';
import { ModuleResults } from './module-results';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

function moduleCase(extra: Record<string, unknown>): Record<string, unknown> {
  const detail = runDetail('succeeded', { result: true });
  const parsed = parseRunResult(detail.result);
  if (!parsed?.ok) throw new Error('the fixture result does not parse');
  const legs = legsFromRun(detail.case, resultLegs(parsed.result));
  return { hotSide: 300, deltaT: 20, p: legs.optimum, n: { length: 1.5e-3, area: 1e-6, material: { ...pBand, carrier: 'n' }, doping: 2e19 }, couples: 4, points: 12, deltaTPoints: 5, tradeCouples: [1, 4, 8], ...extra };
}

describe('ModuleResults', () => {
  it('lists the module’s marked currents and the N trade, without a limit flag when no limit is set', () => {
    renderWithProviders(<ModuleResults moduleCase={moduleCase({})} />);
    expect(within(screen.getByTestId('module-marked-module-qc')).getByText('Maximum Qc')).toBeOnTheScreen();
    expect(screen.getByTestId('trade-table')).toHaveTextContent(/8/);
    expect(screen.queryByTestId('module-over-limit')).toBeNull();
    expect(screen.getByTestId('module-caution')).toBeOnTheScreen();
  });

  it('flags sampled currents above the user’s limit in words', () => {
    renderWithProviders(<ModuleResults moduleCase={moduleCase({ currentLimit: 1 })} />);
    expect(screen.getByTestId('module-over-limit')).toHaveTextContent(/of 12 sampled currents are over the 1 A limit/);
  });

  it('says why when the module has no curves', () => {
    renderWithProviders(<ModuleResults moduleCase={moduleCase({ deltaT: 400 })} />);
    expect(screen.getByTestId('module-problem')).toBeOnTheScreen();
  });
});
