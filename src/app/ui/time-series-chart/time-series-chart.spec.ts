import { TestBed } from '@angular/core/testing';
import type { ChartSeriesSet } from './chart-series';
import { nearestSampleIndex } from './chart-series';
import { CHART_FRAME } from './draw-time-series';
import { TimeSeriesChart } from './time-series-chart';

const levels: ChartSeriesSet = {
  t_s: [0, 60, 120, 180, 240],
  lines: [
    { id: 'level:tank', label: 'tank', values: [0.5, 0.48, 0.46, 0.47, 0.5] },
    { id: 'level:bed-a', label: 'bed-a', values: [0, 0.1, 0.2, null, 0.05] },
  ],
};

async function render(inputs: Record<string, unknown>) {
  const fixture = TestBed.createComponent(TimeSeriesChart);
  for (const [name, value] of Object.entries({ data: levels, dimension: 'length', ...inputs })) {
    fixture.componentRef.setInput(name, value);
  }
  await fixture.whenStable();
  return { fixture, root: fixture.nativeElement as HTMLElement };
}

function hoverAt(root: HTMLElement, clientX: number): void {
  const svg = root.querySelector('svg');
  svg?.dispatchEvent(new MouseEvent('pointermove', { clientX, clientY: 100, bubbles: true }));
}

describe('TimeSeriesChart', () => {
  it('draws one path per line and names each in the legend', async () => {
    const { root } = await render({ heading: 'Levels' });
    expect(root.querySelectorAll('path[data-line]').length).toBe(2);
    const legend = [...root.querySelectorAll('.legend li')].map((li) => li.textContent?.trim());
    expect(legend).toEqual(['tank', 'bed-a']);
  });

  it('draws an overlay dashed and labels both sets in the legend', async () => {
    const overlay: ChartSeriesSet = {
      t_s: [0, 120, 240],
      lines: [{ id: 'level:tank', label: 'tank', values: [0.5, 0.4, 0.45] }],
    };
    const { root } = await render({ overlay, dataName: 'run 1', overlayName: 'run 2' });
    const dashed = root.querySelector('path[data-line="overlay:level:tank"]');
    expect(dashed?.getAttribute('stroke-dasharray')).toBe('6 4');
    const legend = [...root.querySelectorAll('.legend li')].map((li) => li.textContent?.trim());
    expect(legend).toContain('tank (run 2)');
    expect(legend).toContain('tank (run 1)');
  });

  it("labels the value axis in the reader's units", async () => {
    const { root } = await render({ heading: 'Levels', system: 'us' });
    expect(root.querySelector('text.y-title')?.textContent).toBe('Levels (in)');
  });

  it("reads out every line at the hovered time in the reader's units", async () => {
    const { fixture, root } = await render({ system: 'us' });
    const emitted: number[] = [];
    fixture.componentInstance.cursorChange.subscribe((t) => emitted.push(t));
    // Pixel of t = 120 s on the unzoomed axis (jsdom puts the SVG at the page origin, 1:1).
    const plotWidth = CHART_FRAME.width - CHART_FRAME.left - CHART_FRAME.right;
    hoverAt(root, CHART_FRAME.left + plotWidth / 2);
    await fixture.whenStable();
    expect(emitted[0]).toBeCloseTo(120, 6);
    expect(root.querySelector('.readout .time')?.textContent).toBe('2 min 00 s');
    const values = [...root.querySelectorAll('.readout .value')].map((v) => v.textContent);
    // 0.46 m = 18.11 in; 0.2 m = 7.874 in.
    expect(values).toEqual(['18.11 in', '7.874 in']);
  });

  it('draws the outside cursor at its time', async () => {
    const { root } = await render({ cursorS: 240 });
    const cursor = root.querySelector('line.cursor');
    expect(Number(cursor?.getAttribute('x1'))).toBeCloseTo(
      CHART_FRAME.width - CHART_FRAME.right,
      6,
    );
  });

  it('finds the nearest sample on either side of a time', () => {
    expect(nearestSampleIndex([0, 10, 20], 14)).toBe(1);
    expect(nearestSampleIndex([0, 10, 20], 16)).toBe(2);
    expect(nearestSampleIndex([0, 10, 20], -5)).toBe(0);
    expect(nearestSampleIndex([], 3)).toBe(-1);
  });

  it('exports a stand-alone SVG document with its lines', async () => {
    const { fixture } = await render({ heading: 'Levels' });
    const markup = fixture.componentInstance.svgMarkup();
    expect(markup).toContain('xmlns="http://www.w3.org/2000/svg"');
    expect(markup.match(/<path[^>]*data-line=/g)?.length).toBe(2);
  });
});
