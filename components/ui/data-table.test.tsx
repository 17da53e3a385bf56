import { fireEvent, screen, within } from '@testing-library/react-native';
import type { ReactTestInstance } from 'react-test-renderer';
import { useIsWide } from '@/components/shell/use-is-wide';
import { renderWithProviders } from '@/components/test-utils';
import { DataTable, type DataColumn } from './data-table';

jest.mock('@/components/shell/use-is-wide', () => ({ useIsWide: jest.fn(() => false) }));
const wideMock = useIsWide as jest.MockedFunction<typeof useIsWide>;

type Leg = { name: string; deltaT: number; current: number };
const legs: Leg[] = [
  { name: 'Graded', deltaT: 77.4, current: 3.86 },
  { name: 'Uniform', deltaT: 70.3, current: 3.1 },
];
const columns: DataColumn<Leg>[] = [
  { key: 'name', head: 'Leg', width: 100, cell: (l) => l.name },
  { key: 'deltaT', head: 'ΔT', unit: 'K', width: 90, mono: true, cell: (l) => String(l.deltaT) },
  { key: 'current', head: 'I', unit: 'A', width: 90, mono: true, cell: (l) => ({ main: String(l.current), sub: 'at max ΔT' }) },
];

/** Host views with a role: the testing library's role queries match only accessibility elements, not plain views. */
const withRole = (role: string, root: ReactTestInstance = screen.root) => root.findAll((n) => typeof n.type === 'string' && n.props.role === role);

const table = (phone: 'scroll' | 'cards') => (
  <DataTable label="Legs" testID="legs" phone={phone} columns={columns} rows={legs} rowKey={(l) => l.name} rowTestID={(l) => `leg-${l.name}`} />
);

describe('DataTable', () => {
  it('lays out heads with their units and one row per item on a wide window, whatever a phone would do', () => {
    wideMock.mockReturnValue(true);
    renderWithProviders(table('cards'));
    const heads = withRole('columnheader');
    expect(heads.map((h) => within(h).queryAllByText(/./).map((t) => t.props.children).join(' '))).toEqual(['Leg', 'ΔT K', 'I A']);
    const graded = within(screen.getByTestId('leg-Graded'));
    expect(withRole('cell', screen.getByTestId('leg-Graded'))).toHaveLength(3);
    expect(graded.getByText('3.86')).toBeOnTheScreen();
    expect(graded.getByText('at max ΔT')).toBeOnTheScreen();
  });

  it('shows a card per row on a phone: the first column as its title, every value under its head and unit', () => {
    wideMock.mockReturnValue(false);
    renderWithProviders(table('cards'));
    expect(withRole('columnheader')).toHaveLength(0);
    const card = within(screen.getByTestId('leg-Uniform'));
    expect(withRole('rowheader', screen.getByTestId('leg-Uniform'))[0]).toHaveTextContent('Uniform');
    expect(card.getByText('ΔT (K)')).toBeOnTheScreen();
    expect(card.getByText('I (A)')).toBeOnTheScreen();
    expect(card.getByText('70.3')).toBeOnTheScreen();
  });

  it('keeps the table on a phone when asked to scroll, and says so only while the table is wider than its card', () => {
    wideMock.mockReturnValue(false);
    renderWithProviders(table('scroll'));
    expect(withRole('columnheader')).toHaveLength(3);
    const scroller = screen.getByTestId('legs-scroll');
    expect(screen.queryByTestId('side-scroll-cue')).toBeNull();
    fireEvent(scroller, 'layout', { nativeEvent: { layout: { width: 300, height: 100, x: 0, y: 0 } } });
    fireEvent(scroller, 'contentSizeChange', 280, 100);
    expect(screen.queryByTestId('side-scroll-cue')).toBeNull();
    fireEvent(scroller, 'contentSizeChange', 480, 100);
    expect(screen.getByTestId('side-scroll-cue')).toHaveTextContent('Scroll sideways for more →');
    expect(screen.getByTestId('side-scroll-fade')).toBeOnTheScreen();
    // Scrolled to the end: nothing more to the right, no fade.
    fireEvent.scroll(scroller, { nativeEvent: { contentOffset: { x: 180, y: 0 }, contentSize: { width: 480, height: 100 }, layoutMeasurement: { width: 300, height: 100 } } });
    expect(screen.queryByTestId('side-scroll-fade')).toBeNull();
  });
});
