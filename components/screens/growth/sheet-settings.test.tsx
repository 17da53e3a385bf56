import { act, fireEvent, screen } from '@testing-library/react-native';
import { renderWithProviders, sessionAs } from '@/components/test-utils';
import { SheetSettings } from './sheet-settings';
import { detail, ids, order, routeFetch } from './test-fixtures';

const sheetUrl = `PUT /api/growth-orders/${ids.order}/sheet`;

describe('SheetSettings', () => {
  it('offers only the zone counts the sheet holds', () => {
    routeFetch({});
    renderWithProviders(<SheetSettings order={order()} maxZones={4} />, { session: sessionAs('physicist') });
    for (const k of [1, 2, 3, 4]) expect(screen.getByTestId(`zones-${k}`)).toBeOnTheScreen();
    expect(screen.queryByTestId('zones-5')).toBeNull();
    expect(screen.getByTestId('zones-3')).toBeChecked();
  });

  it('refuses a budget that is not a number, then sends K, budget and temperature', async () => {
    const { requests } = routeFetch({ [sheetUrl]: { status: 200, body: detail() } });
    renderWithProviders(<SheetSettings order={order()} maxZones={6} />, { session: sessionAs('physicist') });
    fireEvent.press(screen.getByTestId('zones-5'));
    fireEvent.changeText(screen.getByTestId('field-loss-budget'), 'one');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Apply settings' })));
    expect(screen.getByTestId('error-loss-budget')).toHaveTextContent('ΔT loss budget must be a number');
    expect(requests).toHaveLength(0);
    fireEvent.changeText(screen.getByTestId('field-loss-budget'), '0.5');
    fireEvent.changeText(screen.getByTestId('field-check-temperature'), '295');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Apply settings' })));
    expect(requests[0]).toMatchObject({ method: 'PUT', url: sheetUrl.slice(4), body: { zones: 5, lossBudget: 0.5, measureTemperature: 295 } });
  });
});
