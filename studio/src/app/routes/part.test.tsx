import { screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { PartRoute } from './part';

// An invented part with a photo and a bore, and one reading of the bore.
const PART = {
  id: 'p1',
  workshopId: 'w1',
  partNumber: 'HL-2107',
  maker: 'Brackwater Driveline',
  title: '27-tooth motor coupler',
  category: 'coupler',
  source: 'new',
  notes: '',
  photos: [{ id: 'ph1', url: '/photo.png', createdAt: '2026-03-01T00:00:00.000Z' }],
  features: [{ id: 'f1', partId: 'p1', name: 'pilot bore', kind: 'diameter', unit: 'mm', spec: { role: 'hole', nominalNm: 15_000_000 }, shown: { nominal: '15 mm' } }],
  createdAt: '2026-03-01T00:00:00.000Z',
  updatedAt: '2026-03-01T00:00:00.000Z',
};
const READINGS = {
  measurements: [
    {
      id: 'm1',
      featureId: 'f1',
      interfaceId: null,
      quantity: 'diameter',
      value: '15.008',
      unit: 'mm',
      valueNm: 15_008_000,
      shown: '15.008 mm',
      instrument: { kind: 'bore_gauge', resolutionNm: 1000, resolution: '0.001', calibratedOn: null, note: '' },
      temperatureC: null,
      takenBy: 'u1',
      takenAt: '2026-03-02T10:00:00.000Z',
      footageId: null,
      footageTimeMs: null,
      note: '',
    },
  ],
  summary: { count: 1, unit: 'mm', meanNm: 15_008_000, spreadNm: 0, mean: '15.008 mm', spread: '0 mm' },
};

function showPartAs(role: 'admin' | 'editor') {
  stubApi([
    {
      path: /^\/workshops\/w1$/,
      body: { id: 'w1', slug: 'harrow-lane', name: 'Harrow Lane Garage', description: '', logoUrl: null, disabled: false, role, createdAt: '2026-12-01T00:00:00.000Z' },
    },
    { path: /^\/workshops\/w1\/parts\/p1$/, body: PART },
    { path: /^\/workshops\/w1\/measurements/, body: READINGS },
  ]);
  renderWithProviders(
    <Routes>
      <Route path="/workshops/:workshopId/parts/:partId" element={<PartRoute />} />
    </Routes>,
    { route: '/workshops/w1/parts/p1' },
  );
}

describe('the part page for a site admin (role admin, read-only)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows the part, its photos, features and readings with no control that would answer "Workshop not found"', async () => {
    showPartAs('admin');
    expect(await screen.findByText('1 reading · mean 15.008 mm · spread 0 mm')).toBeTruthy();
    expect(screen.getByText('Reading as a site administrator')).toBeTruthy();
    expect(screen.getByAltText('HL-2107 photo 1')).toBeTruthy();
    for (const name of ['Edit part', 'Remove', 'Add a photo', 'Remove photo 1', 'Add feature', 'Edit', 'Add reading']) {
      expect(screen.queryAllByRole('button', { name })).toHaveLength(0);
    }
  });

  it('an editor keeps every control', async () => {
    showPartAs('editor');
    expect(await screen.findByText('1 reading · mean 15.008 mm · spread 0 mm')).toBeTruthy();
    for (const name of ['Edit part', 'Add a photo', 'Remove photo 1', 'Add feature', 'Edit', 'Add reading']) {
      expect(screen.getAllByRole('button', { name }).length).toBeGreaterThan(0);
    }
    // The part's Remove, the feature's Remove and the reading's Remove.
    expect(screen.getAllByRole('button', { name: 'Remove' })).toHaveLength(3);
  });
});
