import { fireEvent, screen, within } from '@testing-library/react-native';
import type { OperatingPoint } from '@/shared/engine';
import { renderWithProviders, sessionAs } from '@/components/test-utils';
import { parseRunResult } from '@/components/screens/runs/run-result';
import { runDetail } from '@/components/screens/runs/test-fixtures';
import { CurvesBody } from './curves-body';
import { MarkedCurrentsTable } from './marked-currents-table';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

const point = (current: number, overLimit: boolean, cop: number | null = 0.8): OperatingPoint => ({
  current,
  heatLoad: 0.25,
  heatRejected: 0.6,
  voltage: 0.07,
  power: 0.35,
  cop,
  overLimit,
  coldSide: 270,
  hotSide: 300,
  coldJunction: 270,
  hotJunction: 300,
});

describe('MarkedCurrentsTable', () => {
  it('lists both marked currents in A, W and V and flags an over-limit current in words', () => {
    renderWithProviders(
      <MarkedCurrentsTable rows={[{ key: 'optimum', label: 'Graded optimum', maxHeatLoad: point(5.25, true), maxCop: point(1.5, false, 0.72) }]} />,
    );
    const qc = screen.getByTestId('marked-currents-optimum-qc');
    expect(within(qc).getByText('5.25 (over the limit)')).toBeOnTheScreen();
    const best = screen.getByTestId('marked-currents-optimum-cop');
    expect(within(best).getByText('1.5')).toBeOnTheScreen();
    expect(within(best).queryByText(/over the limit/)).toBeNull();
    expect(within(best).getByText('0.72')).toBeOnTheScreen();
    // A phone shows one card per marked current, each number under its quantity and unit.
    expect(within(qc).getByText('Graded optimum · Maximum Qc')).toBeOnTheScreen();
    expect(within(qc).getByText('I (A)')).toBeOnTheScreen();
    expect(within(qc).getByText('Qc (W)')).toBeOnTheScreen();
  });

  it('says when there is no maximum COP (ΔT = 0 K)', () => {
    renderWithProviders(<MarkedCurrentsTable rows={[{ key: 'uniform', label: 'Best uniform', maxHeatLoad: point(3, false), maxCop: null }]} />);
    expect(within(screen.getByTestId('marked-currents-uniform-cop')).getByText('none at ΔT = 0 K')).toBeOnTheScreen();
    // On a phone's card the empty quantities of that line are left out rather than shown blank.
    expect(within(screen.getByTestId('marked-currents-uniform-cop')).queryByText('Qc (W)')).toBeNull();
    expect(within(screen.getByTestId('marked-currents-uniform-qc')).getByText('Qc (W)')).toBeOnTheScreen();
  });

  it('leaves the device column out for a single device named around the table', () => {
    renderWithProviders(
      <MarkedCurrentsTable rows={[{ key: 'module', label: 'Module', maxHeatLoad: point(3, false), maxCop: point(1.2, false) }]} deviceHead={null} testID="module-marked" />,
    );
    expect(screen.queryByText('Leg')).toBeNull();
    expect(screen.queryByText('Module')).toBeNull();
    expect(within(screen.getByTestId('module-marked-module-qc')).getByText('Maximum Qc')).toBeOnTheScreen();
    expect(within(screen.getByTestId('module-marked-module-cop')).getByText('1.2')).toBeOnTheScreen();
  });
});

describe('CurvesBody', () => {
  const detail = runDetail('succeeded', { result: true });
  const parsed = parseRunResult(detail.result);
  if (!parsed?.ok) throw new Error('the fixture result does not parse');

  it('computes the optimum and baselines with the engine and marks both currents', () => {
    renderWithProviders(<CurvesBody runCase={detail.case} result={parsed.result} />, { session: sessionAs('viewer') });
    const max = screen.getByTestId('marked-currents-optimum-qc');
    expect(within(max).getByText('Graded optimum · Maximum Qc')).toBeOnTheScreen();
    expect(screen.getByTestId('marked-currents-optimum-cop')).toBeOnTheScreen();
    expect(screen.getByTestId('marked-currents-uniform-qc')).toBeOnTheScreen();
    expect(screen.getByTestId('pumping-range-optimum')).toHaveTextContent(/pumps heat from .* A to .* A\./);
    expect(screen.getByTestId('curves-caution')).toHaveTextContent(/high currents|hot side can burn/);
  });

  it('flags currents over the limit and says when a leg cannot hold ΔT', () => {
    renderWithProviders(<CurvesBody runCase={detail.case} result={parsed.result} />, { session: sessionAs('viewer') });
    fireEvent.changeText(screen.getByTestId('field-curve-current-limit'), '2');
    expect(screen.getByTestId('pumping-range-optimum')).toHaveTextContent(/ of 40 sampled currents over the 2 A limit/);
    fireEvent.changeText(screen.getByTestId('field-curve-delta-t'), '250');
    expect(screen.getByTestId('curves-cannot-hold')).toHaveTextContent(/Graded optimum: cannot hold this ΔT/);
  });
  it('takes the load side as a cold-side temperature Tc too: the same curves as ΔT = Th − Tc', () => {
    renderWithProviders(<CurvesBody runCase={detail.case} result={parsed.result} />, { session: sessionAs('viewer') });
    const shown = () => JSON.stringify(within(screen.getByTestId('marked-currents-optimum-qc')).getAllByText(/\d/).map((n) => n.props.children));
    fireEvent.changeText(screen.getByTestId('field-curve-delta-t'), '40');
    const atDeltaT40 = shown();
    fireEvent.press(screen.getByTestId('curve-by-cold-side'));
    fireEvent.changeText(screen.getByTestId('field-curve-cold-side'), String(parsed.result.hotSide - 20));
    expect(shown()).not.toBe(atDeltaT40);
    fireEvent.changeText(screen.getByTestId('field-curve-cold-side'), String(parsed.result.hotSide - 40));
    expect(screen.getByTestId('curve-derived-delta-t')).toHaveTextContent(/= 40\sK$/);
    expect(shown()).toBe(atDeltaT40);
    fireEvent.changeText(screen.getByTestId('field-curve-cold-side'), String(parsed.result.hotSide + 5));
    expect(screen.getByText(/cold-side temperature Tc must be .* at most Th/)).toBeOnTheScreen();
  });
});
