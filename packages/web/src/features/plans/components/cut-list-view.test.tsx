import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { catchDownloads, readBlob } from '../../../testing/downloads';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoCutList } from '../test-drawings';
import { renderWithTheme } from '../test-render';
import { CutListView } from './cut-list-view';

const circleJig = demoCutList('band-saw-circle-jig', 1, 'circle-jig.dxf');

const view = (props: Partial<Parameters<typeof CutListView>[0]> = {}) => (
  <CutListView
    cutList={circleJig}
    units="mm"
    kerf={3.2}
    fileName="circle-jig-r1-cut-list.csv"
    selectedPart={null}
    onSelectPart={() => undefined}
    {...props}
  />
);

describe('the cut list view', () => {
  afterEach(() => vi.restoreAllMocks());

  it('has one table per material, thickness and stock, with a row per part', () => {
    renderWithTheme(view());
    const tables = screen.getAllByRole('table');
    expect(tables).toHaveLength(circleJig.groups.length);
    const platform = screen.getByRole('table', { name: 'Baltic birch plywood, 12 mm, sheet goods' });
    expect(within(platform).getByRole('row', { name: /Platform/ }).textContent).toContain('1');
    const rows = tables.flatMap((table) =>
      within(table)
        .getAllByRole('row')
        .filter((row) => row.hasAttribute('data-part-row')),
    );
    expect(rows).toHaveLength(circleJig.groups.reduce((sum, group) => sum + group.rows.length, 0));
  });

  it('gives board feet for solid stock only, from the rough size', () => {
    renderWithTheme(view());
    const solid = screen.getByRole('table', { name: 'maple, 19 mm, solid stock' });
    const row = circleJig.groups.find((group) => group.stock === 'solid')!.rows[0]!;
    expect(within(solid).getByRole('row', { name: new RegExp(row.name) }).textContent).toContain(
      `${row.boardFeet!.toFixed(2)} bd ft`,
    );
    const sheet = screen.getByRole('table', { name: 'Baltic birch plywood, 12 mm, sheet goods' });
    expect(within(sheet).queryByText(/bd ft/)).toBeNull();
  });

  it('writes sizes in inches when the member reads inches', () => {
    renderWithTheme(view({ units: 'in' }));
    // 12 mm = 0.472 in → 15/32 in (1 in = 25.4 mm).
    expect(screen.getByRole('table', { name: 'Baltic birch plywood, 15/32 in, sheet goods' })).toBeTruthy();
    expect(screen.queryByText(/\d mm$/)).toBeNull();
  });

  it('draws every sheet with its parts and every bar with its pieces', () => {
    renderWithTheme(view());
    const sheetGroups = circleJig.groups.filter((group) => group.sheets);
    const sheets = sheetGroups.flatMap((group) => group.sheets!.sheets);
    expect(document.querySelectorAll('svg[data-sheet]')).toHaveLength(sheets.length);
    expect(document.querySelectorAll('[data-placement]')).toHaveLength(
      sheets.reduce((sum, sheet) => sum + sheet.placements.length, 0),
    );
    const bars = circleJig.groups.flatMap((group) => group.bars?.bars ?? []);
    expect(bars.length).toBeGreaterThan(0);
    expect(document.querySelectorAll('svg[data-bar]')).toHaveLength(bars.length);
    expect(screen.getAllByRole('img', { name: /% used/ })).toHaveLength(sheets.length);
  });

  it('shows cost only when the shop has prices', () => {
    const { rerender } = renderWithTheme(view());
    expect(screen.queryByText(/cost/i)).toBeNull();
    const priced = demoCutList('band-saw-circle-jig', 1, 'circle-jig.dxf', {
      prices: { perSheet: { '*': 40 }, perBoardFoot: { '*': 6 }, perMetre: { '*': 2 } },
    });
    rerender(view({ cutList: priced }));
    expect(screen.getByText(`Stock cost ${priced.cost!.toFixed(2)}`)).toBeTruthy();
  });

  it('marks the selected part’s row and reports a click on a part', async () => {
    const user = userEvent.setup();
    const onSelectPart = vi.fn();
    renderWithTheme(view({ selectedPart: 'Runner', onSelectPart }));
    expect(screen.getByRole('button', { name: 'Runner' }).getAttribute('aria-pressed')).toBe('true');
    expect(document.querySelector('[data-selected]')?.getAttribute('data-part-row')).toBe('Runner');
    await user.click(screen.getByRole('button', { name: 'Edge stop' }));
    expect(onSelectPart).toHaveBeenCalledWith('Edge stop');
  });

  it('downloads the core’s CSV and prints the shop sheet', async () => {
    const user = userEvent.setup();
    const { files: made, clicks: click } = catchDownloads();
    const print = vi.spyOn(window, 'print').mockImplementation(() => undefined);
    renderWithTheme(view());
    await user.click(screen.getByRole('button', { name: 'Download CSV' }));
    expect(click).toHaveBeenCalledTimes(1);
    const text = await readBlob(made[0]!);
    const lines = text.trimEnd().split('\r\n');
    expect(lines[0]!.startsWith('material,stock,thickness_mm,part,quantity')).toBe(true);
    expect(lines).toHaveLength(1 + circleJig.groups.reduce((sum, group) => sum + group.rows.length, 0));
    expect(lines.some((line) => line.includes(',Platform,'))).toBe(true);
    await user.click(screen.getByRole('button', { name: 'Print shop sheet' }));
    expect(print).toHaveBeenCalledTimes(1);
  });
});
