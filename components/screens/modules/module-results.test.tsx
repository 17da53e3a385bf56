import { screen, within } from '@testing-library/react-native';
import { parseModuleCase, runModule } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { renderWithProviders } from '@/components/test-utils';
import { moduleCase } from './module-fixtures';
import { ModuleResults } from './module-results';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

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

  it('plots Qc, COP, voltage and current versus ΔT and states the module’s ΔTmax from the engine', () => {
    const moduleCaseJson = moduleCase({});
    renderWithProviders(<ModuleResults moduleCase={moduleCaseJson} />);
    for (const key of ['deltaT', 'deltaT-cop', 'deltaT-voltage', 'deltaT-current']) expect(screen.getByTestId(`module-plot-${key}`)).toBeOnTheScreen();
    const end = runModule(parseModuleCase(moduleCaseJson)).versusDeltaT.deltaTMax;
    expect(screen.getByText(new RegExp(`ΔTmax = ${formatNumber(end.hotSide - end.coldSide, 4)} K at ${formatNumber(end.current, 4)} A`))).toBeOnTheScreen();
    // ΔTmax of a couple exceeds the ΔT its curves versus current were drawn at (20 K here).
    expect(end.hotSide - end.coldSide).toBeGreaterThan(20);
  });
});
