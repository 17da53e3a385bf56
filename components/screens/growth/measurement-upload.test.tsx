import * as DocumentPicker from 'expo-document-picker';
import { act, fireEvent, screen } from '@testing-library/react-native';
import { renderWithProviders } from '@/components/test-utils';
import { MeasurementUpload } from './measurement-upload';
import { ids, report, routeFetch, type Reply } from './test-fixtures';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));
const pickMock = DocumentPicker.getDocumentAsync as jest.MockedFunction<typeof DocumentPicker.getDocumentAsync>;

const uploadUrl = `POST /api/growth-orders/${ids.order}/measurements`;

/** The picker hands over a local file; the device reads it by its URI. */
function picks(name: string, text: string, upload: Reply = { status: 201, body: { report: report() } }) {
  pickMock.mockResolvedValueOnce({ canceled: false, assets: [{ name, size: text.length, uri: `file:///cache/${name}`, mimeType: 'text/csv', lastModified: 0 }] });
  return routeFetch({ [`GET file:///cache/${name}`]: { status: 200, body: text }, [uploadUrl]: upload });
}

const good = ['position_mm,seebeck_uV_per_K,sigma_S_per_cm', '0.2,190,1350', '0.9,188,1390', '1.4,251,690', '1.9,322,250'].join('\n');

async function choose() {
  await act(async () => fireEvent.press(screen.getByRole('button', { name: /^Choose (CSV file|another file)$/ })));
}

function render() {
  return renderWithProviders(<MeasurementUpload orderId={ids.order} lengthMm={2} measureTemperature={300} />);
}

describe('MeasurementUpload', () => {
  beforeEach(() => pickMock.mockReset());

  it('names a broken cell by line and column at once, and offers no upload', async () => {
    const broken = good.replace('0.9,188,', '0.9,1 88,');
    const { requests } = picks('as-grown.csv', broken);
    render();
    await choose();
    expect(await screen.findByTestId('measurement-status')).toHaveTextContent(/cannot be uploaded/);
    expect(screen.getByTestId('upload-errors')).toHaveTextContent(/Line 3, column seebeck_uV_per_K/);
    expect(screen.queryByRole('button', { name: 'Upload measurements' })).toBeNull();
    expect(requests.filter((r) => r.method === 'POST')).toHaveLength(0);
  });

  it('refuses a position beyond the leg before sending', async () => {
    picks('long.csv', `${good}\n2.6,330,240`);
    render();
    await choose();
    expect(await screen.findByTestId('upload-errors')).toHaveTextContent(/Line 6, column position_mm.*outside the leg \(0–2 mm\)/);
  });

  it('previews what was read in the trade’s units, then uploads the file', async () => {
    const { requests } = picks('as-grown.csv', good);
    render();
    await choose();
    expect(await screen.findByTestId('measurement-status')).toHaveTextContent(/Ready to upload.*4 positions from 0\.2\smm to 1\.9\smm/);
    // Units in the heads, values under them: line 2 read as 0.2 mm, 190 µV/K and 1350 S/cm.
    expect(screen.getByTestId('measurement-rows')).toHaveTextContent(/^Line\s?x\s?mmS\s?µV\/Kσ\s?S\/cm/);
    expect(screen.getByTestId('measurement-row-2')).toHaveTextContent(/^20\.21901350$/);
    fireEvent.changeText(screen.getByTestId('field-measure-temperature'), '29.5');
    expect(screen.getByTestId('error-measure-temperature')).toHaveTextContent(/kelvin/);
    fireEvent.changeText(screen.getByTestId('field-measure-temperature'), '296');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Upload measurements' })));
    const post = requests.find((r) => r.method === 'POST');
    expect(post?.url).toBe(uploadUrl.slice(5));
    const form = post?.body as FormData;
    expect(form.getAll('temperature')).toEqual(['296']);
    expect(await screen.findByTestId('measurements-saved')).toBeOnTheScreen();
  });

  it('shows the server’s located errors when it refuses the file', async () => {
    picks('as-grown.csv', good, { status: 400, body: { name: 'ValidationError', message: 'Some fields are not valid.', errors: [{ field: 'file:line 4:sigma_S_per_cm', message: 'conductivity must be greater than 0' }] } });
    render();
    await choose();
    await act(async () => fireEvent.press(await screen.findByRole('button', { name: 'Upload measurements' })));
    expect(await screen.findByTestId('upload-errors')).toHaveTextContent(/Line 4, column sigma_S_per_cm.*conductivity must be greater than 0/);
  });

  it('offers a Hall factor for Hall concentrations, checks it, and sends it; without Hall values there is no such field', async () => {
    const hall = ['position_mm,n_per_cm3', '0.2,2.1e19', '0.9,2.0e19', '1.4,8.5e18', '1.9,2.2e18'].join('\n');
    const { requests } = picks('hall.csv', hall);
    render();
    await choose();
    expect(await screen.findByTestId('measurement-status')).toHaveTextContent(/Ready to upload/);
    fireEvent.changeText(screen.getByTestId('field-hall-factor'), '7');
    expect(screen.getByTestId('error-hall-factor')).toHaveTextContent(/^Hall factor r_H must be 0.5–2/);
    expect(screen.getByRole('button', { name: 'Upload measurements' })).toBeDisabled();
    fireEvent.changeText(screen.getByTestId('field-hall-factor'), '1.1');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Upload measurements' })));
    expect((requests.find((r) => r.method === 'POST')?.body as FormData).getAll('hallFactor')).toEqual(['1.1']);

    picks('as-grown.csv', good);
    await choose();
    expect(await screen.findByTestId('measurement-status')).toHaveTextContent(/Ready to upload/);
    expect(screen.queryByTestId('field-hall-factor')).toBeNull();
  });
});
