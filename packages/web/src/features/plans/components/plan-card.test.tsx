import { screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import type { PlanCard as PlanCardData } from '../api/types';
import { analyseDemoDrawing } from '../test-drawings';
import { renderWithTheme } from '../test-render';
import { PlanCard } from './plan-card';
import { thumbnailPath } from './parts-thumbnail';

const analysis = analyseDemoDrawing('band-saw-circle-jig/r1/circle-jig.dxf');
const plan: PlanCardData = {
  slug: 'band-saw-circle-jig',
  title: 'Band-saw circle jig',
  summary: 'A runner-guided platform for the band saw.',
  category: 'circle-jig',
  designer: { id: 3, login: 'ruairi-quennell', displayName: 'Ruairí Quennell', avatarUrl: null },
  licence: 'CC0-1.0',
  motorised: false,
  tags: [],
  tools: ['band-saw'],
  latestRevision: { number: 1, publishedAt: '2025-05-11T00:00:00.000Z' },
  rating: { average: 4.5, count: 2 },
  buildCount: 1,
  thumbnail: { extents: analysis.extents!, outlines: analysis.parts.map((part) => part.outline.points) },
};

function renderCard(card: PlanCardData) {
  const router = createMemoryRouter([
    { path: '*', element: <PlanCard plan={card} href="/plans/band-saw-circle-jig" /> },
  ]);
  return renderWithTheme(<RouterProvider router={router} />);
}

describe('the library card', () => {
  it('links the title to the plan and says who drew it, how it rates and how often it was built', () => {
    renderCard(plan);
    expect(screen.getByRole('link', { name: 'Band-saw circle jig' }).getAttribute('href')).toBe(
      '/plans/band-saw-circle-jig',
    );
    expect(screen.getByText(/by Ruairí Quennell/)).toBeTruthy();
    expect(screen.getByText('Rated 4.5 of 5 by 2')).toBeTruthy();
    expect(screen.getByText('Built 1 time')).toBeTruthy();
    expect(
      screen.getByRole('img', { name: `Band-saw circle jig: drawing of ${analysis.parts.length} parts` }),
    ).toBeTruthy();
  });

  it('says so when nobody has rated or built it', () => {
    renderCard({ ...plan, rating: { average: 0, count: 0 }, buildCount: 0, thumbnail: null });
    expect(screen.getByText('Not rated yet')).toBeTruthy();
    expect(screen.getByText('No build reports yet')).toBeTruthy();
    expect(screen.getByRole('img', { name: /no drawing yet/ })).toBeTruthy();
  });

  it('draws every outline inside the thumbnail with y up', () => {
    const thumbnail = {
      extents: { min: [10, 20] as [number, number], max: [110, 70] as [number, number] },
      outlines: [
        [
          [10, 20],
          [110, 20],
          [110, 70],
        ] as [number, number][],
      ],
    };
    // The lowest point of the drawing (y = 20) is at the bottom of the picture (SVG y = 50).
    expect(thumbnailPath(thumbnail)).toBe('M 0 50 L 100 50 L 100 0 Z');
  });
});
