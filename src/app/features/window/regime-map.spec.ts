import { TestBed } from '@angular/core/testing';
import type { Sweep, SweepCell } from '../../../../shared/contracts/sweeps';
import { RegimeMap } from './regime-map';

function sweep(axes: 1 | 2): Sweep {
  const steps = 4;
  const total = axes === 2 ? steps * steps : steps;
  const cells: SweepCell[] = Array.from({ length: total }, (_, index) => ({
    index,
    regime: index % steps === 0 ? 'spill-stall' : 'cycling',
    cycles: 3,
    periodS: 300 + 10 * index,
    floodS: 150,
    drainS: 150 + 10 * index,
    inflowM3PerS: 1e-4,
    verdict: 'ok',
  }));
  const axis = {
    parameter: 'pump-flow-scale' as const,
    target: 'pump',
    from: 0.5,
    to: 2,
    steps,
    current: 1,
    label: 'Flow scale',
  };
  const second = {
    parameter: 'standpipe-height' as const,
    target: 'bed',
    from: 0.1,
    to: 0.2,
    steps,
    current: 0.15,
    label: 'Standpipe height',
  };
  return {
    id: 's',
    systemId: 'x',
    status: 'completed',
    parameters: { axes: axes === 2 ? [axis, second] : [axis], bedId: 'bed', durationS: 3600 },
    cellsTotal: total,
    cellsDone: total,
    progress: 1,
    error: null,
    createdAt: '2026-01-01T00:00:00Z',
    finishedAt: '2026-01-01T00:01:00Z',
    cells,
  };
}

async function render(s: Sweep) {
  const fixture = TestBed.createComponent(RegimeMap);
  fixture.componentRef.setInput('sweep', s);
  await fixture.whenStable();
  return { fixture, root: fixture.nativeElement as HTMLElement };
}

describe('RegimeMap', () => {
  it('draws a two-parameter sweep as one cell per run, coloured by regime, with contours and the design ringed', async () => {
    const { root } = await render(sweep(2));
    expect(root.querySelectorAll('rect.cell').length).toBe(16);
    expect(root.querySelectorAll('rect.regime-spill-stall').length).toBe(4);
    expect(root.querySelectorAll('g.contours path').length).toBeGreaterThan(0);
    expect(root.querySelectorAll('g.current-design circle').length).toBe(2);
    const legend = [...root.querySelectorAll('.legend li')].map((li) =>
      li.textContent?.replace(/\s+/g, ' ').trim(),
    );
    expect(legend).toEqual(['Cycling 12', 'Spill stall 4']);
  });

  it('draws a one-parameter sweep as regime bands behind period, flood and drain lines', async () => {
    const { root } = await render(sweep(1));
    expect(root.querySelectorAll('rect.cell').length).toBe(4);
    expect(root.querySelectorAll('path.line').length).toBe(3);
    expect(root.querySelector('g.current-design line')).not.toBeNull();
  });

  it('reports the index of a clicked cell, and ignores impossible ones', async () => {
    const s = sweep(2);
    const cells = s.cells ?? [];
    cells[6] = {
      ...cells[6],
      index: 6,
      regime: 'invalid',
      cycles: null,
      periodS: null,
      floodS: null,
      drainS: null,
      inflowM3PerS: null,
      verdict: null,
    };
    const { fixture, root } = await render(s);
    const picked: number[] = [];
    fixture.componentInstance.pick.subscribe((index: number) => picked.push(index));
    root
      .querySelector<SVGRectElement>('rect.cell[data-index="5"]')
      ?.dispatchEvent(new MouseEvent('click', { bubbles: true }));
    root
      .querySelector<SVGRectElement>('rect.cell[data-index="6"]')
      ?.dispatchEvent(new MouseEvent('click', { bubbles: true }));
    expect(picked).toEqual([5]);
  });
});
