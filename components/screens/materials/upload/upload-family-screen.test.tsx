import { Text } from 'react-native';
import * as DocumentPicker from 'expo-document-picker';
import { act, fireEvent, screen, waitFor } from 'expo-router/testing-library';
import { maxUploadBytes } from '@/shared/api/family-upload';
import { renderRoutes } from '@/components/test-router';
import { mockFetch, sessionAs } from '@/components/test-utils';
import { brokenPreview, familySummary } from '../test-fixtures';
import { UploadFamilyScreen } from './upload-family-screen';

jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));
jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));

const pickMock = DocumentPicker.getDocumentAsync as jest.MockedFunction<typeof DocumentPicker.getDocumentAsync>;

const routes = {
  index: () => <Text>Materials list</Text>,
  'materials/upload': UploadFamilyScreen,
  'materials/[id]/index': () => <Text>Family page</Text>,
};

function picks(name: string, size: number) {
  pickMock.mockResolvedValueOnce({
    canceled: false,
    assets: [{ name, size, uri: `file:///cache/${name}`, mimeType: 'text/csv', lastModified: 0 }],
  });
}

const okPreview = { ...brokenPreview(), ok: true, errors: [], warnings: [] };

async function choose() {
  await act(async () => fireEvent.press(screen.getByRole('button', { name: /^Choose (CSV file|another file)$/ })));
}

describe('UploadFamilyScreen', () => {
  beforeEach(() => pickMock.mockReset());

  it('previews the chosen file, then saves it with its provenance and opens the family', async () => {
    const saved = familySummary({ id: '55555555-5555-4555-8555-555555555555', kind: 'table', version: 1 });
    const { requests } = mockFetch({ status: 200, body: okPreview }, { status: 201, body: { family: saved, preview: okPreview } });
    const result = renderRoutes(routes, '/materials/upload', sessionAs('physicist'));
    expect(screen.getByTestId('csv-format-help')).toHaveTextContent(/seebeck_uV_per_K · seebeck_mV_per_K · seebeck_V_per_K/);
    expect(screen.getByTestId('csv-format-help')).toHaveTextContent(/Up to 5 MB, 20000 rows, 200 dopings and 300 temperatures\./);

    picks('ingot-9.csv', 2048);
    await choose();
    expect(await screen.findByTestId('preview-status')).toHaveTextContent(/Ready to save/);
    expect(screen.getByTestId('chosen-file')).toHaveTextContent('ingot-9.csv · 2.0 kB');
    expect(requests[0]).toMatchObject({ method: 'POST', url: '/api/families/upload/preview' });

    fireEvent.changeText(screen.getByTestId('field-name'), 'Ingot 9 measured');
    fireEvent.changeText(screen.getByTestId('field-source'), 'Hall and Seebeck, ingot 9');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Save measured family' })));

    await waitFor(() => expect(result.getPathname()).toBe(`/materials/${saved.id}`));
    expect(requests[1]).toMatchObject({ method: 'POST', url: '/api/families/upload' });
  });

  it('keeps Save disabled while the file has errors', async () => {
    mockFetch({ status: 200, body: brokenPreview() });
    renderRoutes(routes, '/materials/upload', sessionAs('physicist'));
    picks('ingot-9.csv', 2048);
    await choose();

    expect(await screen.findByText('This file cannot be saved')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Save measured family' })).toBeDisabled();
    expect(screen.getByText('Saving is possible once the file has no errors.')).toBeOnTheScreen();
  });

  it('asks for a name and a source before saving', async () => {
    const { requests } = mockFetch({ status: 200, body: okPreview });
    renderRoutes(routes, '/materials/upload', sessionAs('admin'));
    picks('ingot-9.csv', 2048);
    await choose();
    await screen.findByText('Ready to save');
    fireEvent.press(screen.getByRole('button', { name: 'Save measured family' }));

    expect(screen.getByTestId('error-name')).toHaveTextContent('Name is required');
    expect(screen.getByTestId('error-source')).toHaveTextContent(/Source is required/);
    expect(requests).toHaveLength(1);
  });

  it('shows the server refusing a file over a size cap, naming the cap', async () => {
    const message = 'the file has 2000 different carrier concentrations; a table holds at most 200 (a measurement campaign has tens)';
    mockFetch({ status: 400, body: { name: 'ValidationError', message: `file: ${message}`, errors: [{ field: 'file', message }] } });
    renderRoutes(routes, '/materials/upload', sessionAs('physicist'));
    picks('sparse.csv', 66_000);
    await choose();

    expect(await screen.findByText('File refused')).toBeOnTheScreen();
    expect(screen.getByText(`file: ${message}`)).toBeOnTheScreen();
    expect(screen.queryByTestId('upload-preview')).toBeNull();
  });

  it('refuses a file over the limit without uploading it', async () => {
    const { calls } = mockFetch({ status: 200, body: okPreview });
    renderRoutes(routes, '/materials/upload', sessionAs('physicist'));
    picks('huge.csv', maxUploadBytes + 1);
    await choose();

    expect(await screen.findByText(/huge\.csv is 5\.0 MB; the limit is 5\.0 MB\./)).toBeOnTheScreen();
    expect(calls).toEqual([]);
  });
});
