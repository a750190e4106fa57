import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { LineEstimate } from '@shared/estimate/estimate-line';
import { EstimateTotalsView } from '@/features/planning/components/estimate-totals';
import { LineEstimateView } from '@/features/planning/components/line-estimate';

describe('the estimate’s counts', () => {
  it('write rivets, holes and temporary fasteners with thousands separators, as the bill of stock does', () => {
    render(<EstimateTotalsView totals={{ rivets: 1206, rivetsWithWaste: 1267, drillHoles: { '#40': 1206, '#30': 1206 }, tempFasteners: { '1/8': 1206 }, rules: [] }} wastePercent={5} />);
    const text = document.body.textContent ?? '';
    expect(text).toContain('Rivets1,206');
    expect(text).toContain('1,267');
    expect(text).toContain('#40: 1,206, #30: 1,206');
    expect(text).toContain('1/8 in × 1,206');
    expect(text).not.toContain('1206');
  });

  it('writes a long line’s holes with separators too', () => {
    const line: LineEstimate = { holesPerRow: 603, holes: 1206, pitch: 1, edgeDistance: 0.25, transversePitch: 0.75, grip: 2, drillSequence: ['#40', '#30'], tempFasteners: { '1/8': 1206 }, warnings: [], flushPrep: null, shopHead: null, halfLength: null };
    render(<LineEstimateView line={line} unit="in" kind="blind-structural" layout={{ rows: 2 }} />);
    expect(screen.getByText('1,206 (603 a row × 2 rows)')).toBeTruthy();
    expect(screen.getByText('0.75 in')).toBeTruthy();
  });

  it('writes staggered rows as they are laid out: one hole fewer in every second row', () => {
    // 3 staggered rows of 603: 603 + 602 + 603 = 1,808 (our own arithmetic).
    const line: LineEstimate = { holesPerRow: 603, holes: 1808, pitch: 1, edgeDistance: 0.25, transversePitch: 0.75, grip: 2, drillSequence: ['#40', '#30'], tempFasteners: { '1/8': 603 }, warnings: [], flushPrep: null, shopHead: null, halfLength: null };
    render(<LineEstimateView line={line} unit="in" kind="blind-structural" layout={{ rows: 3, rowPattern: 'staggered' }} />);
    expect(screen.getByText('1,808 (3 staggered rows of 603 and 602)')).toBeTruthy();
    expect(screen.getByText('Transverse pitch (between rows)')).toBeTruthy();
  });
});
