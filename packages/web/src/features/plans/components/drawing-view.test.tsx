import { fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import '../test-pointer-events';
import { analyseDemoDrawing } from '../test-drawings';
import { renderWithTheme } from '../test-render';
import { DrawingView } from './drawing-view';

const analysis = analyseDemoDrawing('shelf-pin-drilling-guide/r1/shelf-pin-guide.dxf');
const viewBox = () => screen.getByTestId('drawing').getAttribute('data-viewbox')!.split(' ').map(Number);

describe('the drawing view', () => {
  it('names a part and its size on hover, in the chosen units', async () => {
    const user = userEvent.setup();
    const { rerender } = renderWithTheme(<DrawingView analysis={analysis} units="mm" label="Drawing r1" />);
    const strip = document.querySelector('path[data-part="Guide strip"]')!;
    await user.hover(strip);
    expect(screen.getByTestId('drawing-caption').textContent).toBe('Guide strip: 800 × 60 mm');
    expect(strip.getAttribute('data-emphasised')).toBe('true');
    rerender(<DrawingView analysis={analysis} units="in" label="Drawing r1" />);
    // 800 mm = 31.496 in → 31-1/2 in; 60 mm = 2.362 in → 2-3/8 in to the nearest 1/32 (1 in = 25.4 mm).
    expect(screen.getByRole('button', { name: 'Guide strip: 31-1/2 × 2-3/8 in' })).toBeTruthy();
  });

  it('draws the measured length and width of the part pointed at or selected', async () => {
    const user = userEvent.setup();
    const { rerender } = renderWithTheme(<DrawingView analysis={analysis} units="mm" label="Drawing r1" />);
    const dimensionTexts = () => [...document.querySelectorAll('[data-dimension] text')].map((t) => t.textContent);
    expect(dimensionTexts()).toEqual([]);
    await user.hover(document.querySelector('path[data-part="Fence lip"]')!);
    expect(dimensionTexts()).toEqual(['800 mm', '25 mm']);
    await user.unhover(document.querySelector('path[data-part="Fence lip"]')!);
    rerender(<DrawingView analysis={analysis} units="in" label="Drawing r1" selectedPart="Guide strip" />);
    // 800 mm → 31-1/2 in, 60 mm → 2-3/8 in, to the nearest 1/32 in.
    expect(dimensionTexts()).toEqual(['31-1/2 in', '2-3/8 in']);
  });

  it('zooms with the buttons, the wheel and the keyboard, pans with arrows and a drag, and fits again', async () => {
    const user = userEvent.setup();
    renderWithTheme(<DrawingView analysis={analysis} units="mm" label="Drawing r1" />);
    const [, , fitWidth] = viewBox();
    await user.click(screen.getByRole('button', { name: 'Zoom in' }));
    expect(viewBox()[2]).toBeCloseTo(fitWidth! / 1.25, 6);
    fireEvent.wheel(screen.getByTestId('drawing'), { deltaY: 100 });
    expect(viewBox()[2]).toBeCloseTo(fitWidth!, 6);
    const area = screen.getByRole('group', { name: /Arrow keys pan/ });
    area.focus();
    await user.keyboard('+');
    const [x0, , width] = viewBox();
    await user.keyboard('{ArrowRight}');
    expect(viewBox()[0]).toBeCloseTo(x0! + width! / 10, 6);
    const svg = screen.getByTestId('drawing');
    const [x1, y1] = viewBox();
    fireEvent.pointerDown(svg, { clientX: 100, clientY: 100, pointerId: 1 });
    fireEvent.pointerMove(svg, { clientX: 60, clientY: 120, pointerId: 1 });
    fireEvent.pointerUp(svg, { pointerId: 1 });
    const [x2, y2] = viewBox();
    // Dragging left moves the view right and dragging down moves it up.
    expect(x2).toBeGreaterThan(x1!);
    expect(y2).toBeLessThan(y1!);
    await user.click(screen.getByRole('button', { name: 'Fit' }));
    expect(viewBox()[2]).toBeCloseTo(fitWidth!, 6);
  });

  it('selects a part by click or by keyboard', async () => {
    const user = userEvent.setup();
    const onSelectPart = vi.fn();
    renderWithTheme(<DrawingView analysis={analysis} units="mm" label="Drawing r1" onSelectPart={onSelectPart} />);
    await user.click(screen.getByRole('button', { name: 'Fence lip: 800 × 25 mm' }));
    screen.getByRole('button', { name: 'Guide strip: 800 × 60 mm' }).focus();
    await user.keyboard('{Enter}');
    expect(onSelectPart.mock.calls).toEqual([['Fence lip'], ['Guide strip']]);
  });
});
