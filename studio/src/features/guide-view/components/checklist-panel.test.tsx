import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ChecklistPanel } from './checklist-panel';
import { testGuide } from './test-guide';
import { formatDate } from '@/lib/dates';

const checklist = testGuide().checklist!;

describe('ChecklistPanel', () => {
  it('writes each check’s state as words beside its own shape', () => {
    renderWithProviders(<ChecklistPanel checklist={checklist} onSeek={() => {}} />);
    const rows = screen.getAllByTestId('guide-check');
    const read = (index: number) => within(rows[index]).getByTestId('check-state');
    expect(read(0).textContent).toBe('Confirmed on the vehicle');
    expect(read(1).textContent).toBe('Passes on the bench');
    expect(read(2).textContent).toBe('Open');
    expect(read(3).textContent).toBe('Does not fit');
    expect(read(4).textContent).toBe('Retired');
    const shapes = rows.map((row) => row.querySelector('svg[data-icon]')?.getAttribute('data-icon'));
    expect(shapes).toEqual(['confirmed', 'bench_pass', 'open', 'no_fit', 'retired']);
    expect(within(rows[3]).getByText('Optional: does not decide the verdict')).toBeTruthy();
    expect(screen.getByTestId('checklist-verdict').textContent).toMatch(/^Passes on the bench/);
  });

  it('names who confirmed a check only when the answer carries a name (the workshop shows member names)', () => {
    const named = { ...checklist, checks: checklist.checks.map((check, index) => (index === 0 ? { ...check, confirmedBy: 'Quinn Marsh' } : check)) };
    const { unmount } = renderWithProviders(<ChecklistPanel checklist={named} onSeek={() => {}} />);
    const when = formatDate('2026-03-01T09:00:00.000Z');
    expect(within(screen.getAllByTestId('guide-check')[0]).getByText(`Confirmed ${when} by Quinn Marsh`)).toBeTruthy();
    unmount();
    renderWithProviders(<ChecklistPanel checklist={checklist} onSeek={() => {}} />);
    expect(within(screen.getAllByTestId('guide-check')[0]).getByText(`Confirmed ${when}`)).toBeTruthy();
  });

  it('turns evidence with a time into a link that moves the video there', () => {
    const onSeek = vi.fn();
    renderWithProviders(<ChecklistPanel checklist={checklist} onSeek={onSeek} />);
    fireEvent.click(screen.getByRole('button', { name: 'Watch the evidence at 0:09: Slides on by hand' }));
    expect(onSeek).toHaveBeenCalledWith(9_000);
  });

  it('writes the evidence time as text when there is no video to move', () => {
    renderWithProviders(<ChecklistPanel checklist={checklist} />);
    expect(screen.queryByRole('button', { name: /Watch the evidence/ })).toBeNull();
    expect(screen.getByText('Video at 0:09: Slides on by hand')).toBeTruthy();
  });

  it('shows a photo as a thumbnail that opens it full size', async () => {
    const withPhoto = {
      ...checklist,
      checks: [{ ...checklist.checks[0], evidence: [{ kind: 'photo' as const, label: 'Seated on the shaft', startMs: null, photoUrl: '/api/guides/w/g/evidence/e1/photo' }] }],
    };
    renderWithProviders(<ChecklistPanel checklist={withPhoto} onSeek={() => {}} />);
    const thumbnail = screen.getByRole('button', { name: 'Open the photo full size: Seated on the shaft' });
    expect(thumbnail.querySelector('img')?.getAttribute('src')).toBe('/api/guides/w/g/evidence/e1/photo');
    fireEvent.click(thumbnail);
    const dialog = await screen.findByRole('dialog', { name: 'Seated on the shaft' });
    expect(within(dialog).getByRole('img', { name: 'Seated on the shaft' }).getAttribute('src')).toBe('/api/guides/w/g/evidence/e1/photo');
  });
});
