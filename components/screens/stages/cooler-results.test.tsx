import { screen, within } from '@testing-library/react-native';
import { renderWithProviders, sessionAs } from '@/components/test-utils';
import { CascadeResultView } from './cascade-result-view';
import { CoupleResultView } from './couple-result-view';
import { Pyramid } from './pyramid';
import { cascadeResult, coolerIds, coupleResult } from './test-fixtures';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

const widthOf = (id: string) => {
  const style = [screen.getByTestId(id).props.style].flat(3).reduce((all, s) => ({ ...all, ...(s ?? {}) }), {} as Record<string, unknown>);
  return parseFloat(String(style.width));
};

describe('Pyramid', () => {
  it('draws each stage at a width in proportion to its couples, coldest on top, labelled with its temperatures', () => {
    renderWithProviders(<Pyramid stages={cascadeResult().stages} sink={300} />);
    expect(widthOf('pyramid-bar-3')).toBeCloseTo(100, 6);
    expect(widthOf('pyramid-bar-2')).toBeCloseTo((100 * 12) / 36, 6);
    expect(widthOf('pyramid-bar-1')).toBeCloseTo((100 * 4) / 36, 6);
    expect(screen.getByTestId('pyramid-stage-1')).toHaveTextContent(/Stage 1.*203\.2\sK → 231\.5\sK/);
    expect(screen.getByTestId('pyramid')).toHaveTextContent(/^Cold side \(load\) 203\.2\sK.*Heat sink 300\sK$/);
  });
});

describe('CascadeResultView', () => {
  it('shows ΔT as the objective, total power and COP, the stage table in trade units, the curves and the CSV', () => {
    renderWithProviders(<CascadeResultView result={cascadeResult()} runId={coolerIds.cascadeRun} />, { session: sessionAs('viewer') });
    expect(screen.getByTestId('cascade-deltaT')).toHaveTextContent(/objective.*96\.8\sK/);
    expect(screen.getByTestId('cascade-power')).toHaveTextContent(/2\.11\sW/);
    expect(screen.getByTestId('cascade-heatLoad')).toHaveTextContent(/5\smW/);
    const table = screen.getByTestId('stage-table');
    // Heat loads under a watt read in mW; heat rejected has one stage over a watt, so W.
    expect(table).toHaveTextContent(/Heat load\s*mW.*Heat rejected\s*W/);
    expect(within(screen.getByTestId('stage-row-1')).getByText('5')).toBeOnTheScreen();
    expect(within(screen.getByTestId('stage-row-3')).getByText('36')).toBeOnTheScreen();
    expect(within(screen.getByTestId('cascade-curves')).getByTestId('series-plot')).toHaveTextContent(/Qc \(mW\) vs Cold side Tc \(K\).*3 stages \(this cascade\):4 2 stages \(coldest removed\):4 1 stage \(2 coldest removed\):4/);
    expect(screen.getByText('Export cascade CSV')).toBeOnTheScreen();
  });
});

describe('CoupleResultView', () => {
  it('says how far from matched each leg runs and what one current costs, and plots both profiles', () => {
    renderWithProviders(<CoupleResultView result={coupleResult()} runId={coolerIds.coupleRun} />);
    expect(screen.getByTestId('couple-areaRatio')).toHaveTextContent(/0\.82/);
    expect(screen.getByTestId('matching-p')).toHaveTextContent(/p-type leg runs 10\.7 % above its own best.*shared 310 A\/cm² · own best 280 A\/cm²/);
    expect(screen.getByTestId('matching-n')).toHaveTextContent(/n-type leg runs 3\.08 % below its own best/);
    expect(screen.getByTestId('mismatch-cost')).toHaveTextContent('One shared current costs 1.3 K of ΔT against each leg at its own best current (72.9 K with the legs powered separately).');
    expect(within(screen.getByTestId('couple-doping')).getByTestId('series-plot')).toHaveTextContent(/p-type leg, optimised:3 n-type leg, fixed:3/);
  });
});
