import { screen } from '@testing-library/react-native';
import { renderWithProviders } from '@/components/test-utils';
import { BipolarLine, BipolarNotice, bipolarText } from './bipolar-note';

const hotEnd = { share: 0.123, x: 0.0015, temperature: 300, perCm3: 2e18, end: 'hot' as const, bipolar: true };
const outside = { share: 0.046, x: 0.001, temperature: 300, perCm3: 5.3e18, end: 'hot' as const, bipolar: false };

describe('bipolar note beside a run', () => {
  it('says where and how much, in trade units', () => {
    expect(bipolarText(hotEnd)).toBe('In the bipolar region: at the hot end (300 K, n = 2 × 10¹⁸ cm⁻³) minority carriers carry 12.3 % of the current.');
    expect(bipolarText(outside)).toBe('Outside the bipolar region: minority carriers carry at most 4.6 % of the current, at the hot end (300 K, n = 5.3 × 10¹⁸ cm⁻³).');
    expect(bipolarText({ ...hotEnd, x: 0.0004, end: null })).toMatch(/at x = 0\.4 mm/);
  });

  it('warns on the run page when the leg is bipolar, and says so when the family has one band', () => {
    renderWithProviders(<BipolarNotice bipolar={hotEnd} bands="two bands" />);
    expect(screen.getByText('Bipolar conduction in this leg')).toBeTruthy();
    renderWithProviders(<BipolarNotice bipolar={null} bands="one band" />);
    expect(screen.getByText(/bipolar conduction .* is not modelled/)).toBeTruthy();
  });

  it('shows nothing in a list for a run without a minority band', () => {
    renderWithProviders(<BipolarLine bipolar={null} />);
    expect(screen.queryByTestId('run-bipolar')).toBeNull();
  });
});
