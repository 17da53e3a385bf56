import { screen, within } from '@testing-library/react-native';
import { renderWithProviders } from '@/components/test-utils';
import { brokenPreview } from '../test-fixtures';
import { UploadPreview } from './upload-preview';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));

describe('UploadPreview', () => {
  it('locates every error and warning by line and column', () => {
    renderWithProviders(<UploadPreview preview={brokenPreview()} />);

    expect(screen.getByTestId('preview-status')).toHaveTextContent(/This file cannot be saved.*2 errors below/);
    const errors = screen.getByTestId('upload-errors');
    expect(errors).toHaveTextContent(/^2 errors/);
    expect(within(errors).getByText('Line 7, column kappa_W_per_m_K')).toBeOnTheScreen();
    expect(within(errors).getByText('"1,3" is not a number')).toBeOnTheScreen();
    expect(within(errors).getByText('Whole file')).toBeOnTheScreen();
    const warnings = screen.getByTestId('upload-warnings');
    expect(within(warnings).getByText('Line 3, column seebeck_uV_per_K')).toBeOnTheScreen();
    expect(warnings).toHaveTextContent(/was it written in V\/K under a µV\/K header/);
  });

  it('shows the grid coverage with words, not colour alone', () => {
    renderWithProviders(<UploadPreview preview={brokenPreview()} />);

    expect(screen.getByTestId('coverage-grid')).toHaveTextContent(/2 dopings × 3 temperatures: 5 measured, 1 missing\./);
    expect(screen.getByLabelText('3 × 10¹⁹ cm⁻³ at 350 K: missing')).toBeOnTheScreen();
    expect(screen.getByLabelText('3 × 10¹⁹ cm⁻³ at 300 K: measured')).toBeOnTheScreen();
    expect(screen.getAllByLabelText(/: measured$/)).toHaveLength(5);
  });

  it('describes a grid too large to draw by its counts and first holes, drawing no cells', () => {
    const preview = brokenPreview();
    const dopings = Array.from({ length: 200 }, (_, i) => 1e18 * 10 ** (i / 100));
    const temperatures = Array.from({ length: 200 }, (_, j) => 200 + j);
    const firstHoles = temperatures.slice(1, 6).map((temperature) => ({ perCm3: 1e18, temperature }));
    renderWithProviders(<UploadPreview preview={{ ...preview, coverage: { dopings, temperatures, measured: 200, holes: 39800, firstHoles, present: null } }} />);

    expect(screen.getByTestId('coverage-grid')).toHaveTextContent(/200 dopings × 200 temperatures: 200 measured, 39800 missing\./);
    expect(screen.getByTestId('coverage-grid')).toHaveTextContent(/40000 grid points are too many to draw here\./);
    expect(screen.getByTestId('coverage-holes')).toHaveTextContent(/^First missing: 1 × 10¹⁸ cm⁻³ at 201 K; .*1 × 10¹⁸ cm⁻³ at 205 K; and 39795 more\.$/);
    expect(screen.queryByLabelText(/: missing$/)).toBeNull();
  });

  it('lists the recognised columns, the converted rows and plots the measured points', () => {
    renderWithProviders(<UploadPreview preview={brokenPreview()} />);

    const columns = screen.getByTestId('upload-columns');
    expect(columns).toHaveTextContent(/resistivity_mOhm_cmResistivity ρ \(read as σ = 1\/ρ\)Unit mΩ·cm/);
    const rows = screen.getByTestId('upload-rows');
    expect(rows).toHaveTextContent(/All 5 rows\./);
    // Line 5: 3e19 cm⁻³, 250 K, 150 µV/K, 2400 S/cm, 2.1 W/(m·K), back in trade units.
    expect(rows).toHaveTextContent(/53 × 10¹⁹25015024002\.1/);
    // A grid with a hole cannot be interpolated: points only, and a note saying so.
    expect(screen.getByText(/Measured points only, no interpolation/)).toBeOnTheScreen();
    expect(screen.getByTestId('plot-seebeck')).toHaveTextContent(/250 K:0\+2 300 K:0\+2 350 K:0\+1/);
  });

  it('says a clean file is ready, with its grid and carrier', () => {
    const preview = brokenPreview();
    const clean = {
      ...preview,
      ok: true,
      errors: [],
      warnings: [],
      rowCount: 4,
      rows: preview.rows.filter((r) => r.temperature !== 350 && r.line !== 3).concat([{ line: 3, perCm3: 1e19, temperature: 300, seebeck: 2e-4, sigma: 8e4, kappa: 1.4 }]),
      coverage: { dopings: [1e19, 3e19], temperatures: [250, 300], measured: 4, holes: 0, firstHoles: [], present: [[true, true], [true, true]] },
    };
    renderWithProviders(<UploadPreview preview={clean} />);
    expect(screen.getByTestId('preview-status')).toHaveTextContent(/Ready to save.*4 rows on 2 dopings × 2 temperatures · p-type · holes/);
    expect(screen.queryByTestId('upload-errors')).toBeNull();
    expect(screen.getByTestId('plot-zT')).toHaveTextContent(/250 K:41\+2 300 K:41\+2/);
  });
});
