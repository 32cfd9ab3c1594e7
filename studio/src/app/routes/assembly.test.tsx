import { screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { AssemblyRoute } from './assembly';

const mm = (value: number) => Math.round(value * 1_000_000);
const feature = (id: string, partId: string, name: string, spec: Record<string, unknown>) => ({
  id,
  partId,
  name,
  kind: 'diameter',
  unit: 'mm',
  spec,
  shown: { nominal: '15' },
});

// An invented assembly: a coupler's pilot bore on a shaft's journal.
const ASSEMBLY = {
  id: 'a1',
  buildId: 'b1',
  name: '21-tooth coupler',
  notes: '',
  parts: [
    {
      position: 'input side',
      sortOrder: 0,
      part: { id: 'p1', partNumber: 'HL-2107', maker: '', title: 'Motor coupler', category: 'coupler', features: [feature('p1-bore', 'p1', 'pilot bore', { role: 'hole', nominalNm: mm(15), toleranceClass: 'H7' })] },
    },
    {
      position: 'shaft',
      sortOrder: 1,
      part: { id: 'p2', partNumber: 'DS-540', maker: '', title: 'Drive shaft', category: 'shaft', features: [feature('p2-journal', 'p2', 'pilot journal', { role: 'shaft', nominalNm: mm(15), toleranceClass: 'g6' })] },
    },
  ],
  interfaces: [{ id: 'i-fit', kind: 'bore_shaft', name: 'pilot', featureAId: 'p1-bore', featureBId: 'p2-journal', unit: 'mm', margin: null }],
};

function showAssemblyAs(role: 'admin' | 'editor') {
  stubApi([
    {
      path: /^\/workshops\/w1$/,
      body: { id: 'w1', slug: 'harrow-lane', name: 'Harrow Lane Garage', description: '', logoUrl: null, disabled: false, role, createdAt: '2026-12-01T00:00:00.000Z' },
    },
    { path: /^\/workshops\/w1\/assemblies\/a1$/, body: ASSEMBLY },
    { path: /^\/workshops\/w1\/builds\/b1$/, body: { id: 'b1', workshopId: 'w1', title: 'Van conversion', status: 'active', description: '', createdAt: '2026-12-01T00:00:00.000Z', updatedAt: '2026-12-01T00:00:00.000Z' } },
    { path: /^\/workshops\/w1\/measurements/, body: { measurements: [], summary: null } },
    { path: /^\/workshops\/w1\/parts/, body: [] },
  ]);
  renderWithProviders(
    <Routes>
      <Route path="/workshops/:workshopId/assemblies/:assemblyId" element={<AssemblyRoute />} />
    </Routes>,
    { route: '/workshops/w1/assemblies/a1?tab=build' },
  );
}

describe('the assembly’s parts and interfaces for a site admin (role admin, read-only)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows the placed parts and interfaces with no control that would answer "Workshop not found"', async () => {
    showAssemblyAs('admin');
    expect(await screen.findByLabelText('Interface pilot')).toBeTruthy();
    expect(screen.getByText('Reading as a site administrator')).toBeTruthy();
    expect(screen.getByText('HL-2107')).toBeTruthy();
    for (const name of ['Take out', 'Add interface', 'Remove', 'Add reading', 'Place part']) {
      expect(screen.queryAllByRole('button', { name })).toHaveLength(0);
    }
  });

  it('an editor keeps every control', async () => {
    showAssemblyAs('editor');
    expect(await screen.findByLabelText('Interface pilot')).toBeTruthy();
    expect(screen.getAllByRole('button', { name: 'Take out' })).toHaveLength(2);
    expect(screen.getByRole('button', { name: 'Add interface' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Place part' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Remove' })).toBeTruthy();
    expect(await screen.findByRole('button', { name: 'Add reading' })).toBeTruthy();
  });
});
