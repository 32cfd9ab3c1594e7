import { screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi, type StubRoute } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { BuildRoute } from './build';
import { BuildsRoute } from './builds';
import { PartsRoute } from './parts';

function workshopAs(role: 'owner' | 'editor' | 'admin'): StubRoute[] {
  return [
    {
      path: /^\/workshops\/w1$/,
      body: { id: 'w1', slug: 'harrow-lane', name: 'Harrow Lane Garage', description: '', logoUrl: null, disabled: false, role, createdAt: '2026-12-01T00:00:00.000Z' },
    },
    { path: /^\/workshops\/w1\/builds$/, body: [] },
    { path: /^\/workshops\/w1\/builds\/b1$/, body: { id: 'b1', workshopId: 'w1', title: 'Motor-to-gearbox coupler', status: 'active', description: '', createdAt: '2026-12-01T00:00:00.000Z', updatedAt: '2026-12-01T00:00:00.000Z' } },
    { path: /^\/workshops\/w1\/builds\/b1\/assemblies/, body: [] },
    { path: /^\/workshops\/w1\/builds\/b1\/footage/, body: [] },
    { path: /^\/workshops\/w1\/builds\/b1\/guides/, body: [] },
    { path: /^\/workshops\/w1\/parts/, body: [] },
    { path: /^\/workshops\/w1\/footage-limits$/, body: { maxBytes: 10 * 1024 ** 3, types: [{ extension: 'mp4', mimeTypes: ['video/mp4'] }], transcriptMaxBytes: 5 * 1024 ** 2 } },
  ];
}

function renderAt(route: string) {
  return renderWithProviders(
    <Routes>
      <Route path="/workshops/:workshopId/builds" element={<BuildsRoute />} />
      <Route path="/workshops/:workshopId/builds/:buildId" element={<BuildRoute />} />
      <Route path="/workshops/:workshopId/parts" element={<PartsRoute />} />
    </Routes>,
    { route },
  );
}

describe('a site admin reading a workshop (role admin, read-only)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sees the build page without the controls that would only answer "Workshop not found"', async () => {
    stubApi(workshopAs('admin'));
    renderAt('/workshops/w1/builds/b1');
    expect(await screen.findByText('Reading as a site administrator')).toBeTruthy();
    expect(await screen.findByRole('heading', { name: 'Guides' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'New assembly' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'New guide' })).toBeNull();
    expect(await screen.findByText(/No footage yet/)).toBeTruthy();
    expect(screen.queryByTestId('footage-dropzone')).toBeNull();
  });

  it('sees no New build button', async () => {
    stubApi(workshopAs('admin'));
    renderAt('/workshops/w1/builds');
    expect(await screen.findByRole('heading', { name: 'Builds' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'New build' })).toBeNull();
  });

  it('sees no New part button', async () => {
    stubApi(workshopAs('admin'));
    renderAt('/workshops/w1/parts');
    expect(await screen.findByRole('heading', { name: 'Parts' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'New part' })).toBeNull();
  });

  it('an editor of the same workshop keeps every control', async () => {
    stubApi(workshopAs('editor'));
    renderAt('/workshops/w1/builds/b1');
    expect(await screen.findByRole('button', { name: 'New assembly' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'New guide' })).toBeTruthy();
    expect(await screen.findByTestId('footage-dropzone')).toBeTruthy();
    expect(screen.queryByText('Reading as a site administrator')).toBeNull();
  });
});
