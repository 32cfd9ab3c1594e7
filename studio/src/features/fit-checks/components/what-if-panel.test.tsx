import { fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { WhatIfResult } from '../api/queries';
import { WhatIfPanel } from './what-if-panel';

describe('WhatIfPanel', () => {
  afterEach(() => vi.restoreAllMocks());

  it('takes the old answer away when the next change is not a number, and shows the API’s refusal of a shaft with no size', async () => {
    const requests = stubApi([
      {
        path: /what-if\?delta=0\.0004/,
        // DESIGN.md worked example: 0.0004 in (10 160 nm) takes 2.5 % of a 0.016 in (406 400 nm) clearance.
        body: { clearanceNm: 406_400, deltaNm: 10_160, deltaUm: 10.16, deltaThou: 0.4, sharePercent: 2.5, remainingClearanceNm: 396_240, remainingKind: 'clearance' } satisfies WhatIfResult,
      },
      {
        path: /what-if\?delta=-30/,
        status: 400,
        body: { statusCode: 400, message: 'delta must leave a shaft size greater than 0; the shaft measures 25 mm and the change is -30 mm' },
      },
    ]);
    renderWithProviders(<WhatIfPanel workshopId="w1" interfaceId="i1" defaultUnit="in" />);
    const change = screen.getByRole('textbox', { name: /What if the shaft were larger by/ });
    fireEvent.change(change, { target: { value: '0.0004' } });
    fireEvent.click(screen.getByRole('button', { name: 'Work it out' }));
    expect((await screen.findByTestId('what-if-answer')).textContent).toMatch(/takes 2\.5 %/);

    fireEvent.change(change, { target: { value: 'abc' } });
    fireEvent.click(screen.getByRole('button', { name: 'Work it out' }));
    expect(await screen.findByText('The size change must be a number such as 0.0004, or -0.01 for a smaller shaft')).toBeTruthy();
    expect(screen.queryByTestId('what-if-answer')).toBeNull();

    fireEvent.change(change, { target: { value: '-30' } });
    fireEvent.click(screen.getByRole('button', { name: 'Work it out' }));
    expect(await screen.findByText(/^The size change must leave a shaft size greater than 0; the shaft measures 25 mm/)).toBeTruthy();
    expect(screen.queryByTestId('what-if-answer')).toBeNull();
    expect(requests).toHaveLength(2);
  }, 30_000);
});
