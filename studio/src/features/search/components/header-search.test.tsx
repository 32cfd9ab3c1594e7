import { fireEvent, screen } from '@testing-library/react';
import { Route, Routes, useLocation } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { HeaderSearch, isTypingTarget } from './header-search';

function Where() {
  const location = useLocation();
  return <output data-testid="where">{`${location.pathname}${location.search}`}</output>;
}

function Shell() {
  return (
    <>
      <HeaderSearch />
      <input aria-label="Some field" />
      <Routes>
        <Route path="*" element={<Where />} />
      </Routes>
    </>
  );
}

describe('HeaderSearch', () => {
  it('focuses on "/" from the page, but not while typing in a field', () => {
    renderWithProviders(<Shell />, { route: '/guides' });
    const box = screen.getByTestId('header-search');
    fireEvent.keyDown(document.body, { key: '/' });
    expect(document.activeElement).toBe(box);
    (box as HTMLInputElement).blur();
    const field = screen.getByRole('textbox', { name: 'Some field' });
    field.focus();
    fireEvent.keyDown(field, { key: '/' });
    expect(document.activeElement).toBe(field);
  });

  it('leaves on Escape and opens the results page on Enter', () => {
    renderWithProviders(<Shell />, { route: '/guides' });
    const box = screen.getByTestId('header-search');
    box.focus();
    fireEvent.keyDown(box, { key: 'Escape' });
    expect(document.activeElement).not.toBe(box);
    fireEvent.change(box, { target: { value: 'HL-21-CPL coupler' } });
    fireEvent.submit(box.closest('form')!);
    expect(screen.getByTestId('where').textContent).toBe('/search?q=HL-21-CPL+coupler');
  });

  it('knows what counts as typing', () => {
    const area = document.createElement('textarea');
    const div = document.createElement('div');
    expect(isTypingTarget(area)).toBe(true);
    expect(isTypingTarget(div)).toBe(false);
    expect(isTypingTarget(null)).toBe(false);
  });
});
