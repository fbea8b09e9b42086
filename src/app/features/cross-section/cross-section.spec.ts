import { TestBed } from '@angular/core/testing';
import { simulate } from '../../../../engine/index';
import greenhouseFile from '../../../../scenarios/greenhouse-three-beds.json';
import { type Scenario, formatQuantity, parseScenario } from '../../../../shared/scenario';
import { CROSS_SECTION_FRAMES, CrossSection } from './cross-section';
import type { CrossSectionEvent, CrossSectionSeries } from './cross-section-data';
import type { FrameScheduler } from './playback-controller';

/** Animation frames a spec steps by hand. */
class ManualFrames implements FrameScheduler {
  nowMs = 1000;
  private callbacks = new Map<number, (now: number) => void>();
  private nextHandle = 1;
  request(callback: (now: number) => void): number {
    this.callbacks.set(this.nextHandle, callback);
    return this.nextHandle++;
  }
  cancel(handle: number): void {
    this.callbacks.delete(handle);
  }
  now(): number {
    return this.nowMs;
  }
  advance(ms: number): void {
    this.nowMs += ms;
    const due = [...this.callbacks.values()];
    this.callbacks.clear();
    for (const callback of due) callback(this.nowMs);
  }
}

function greenhouse(): Scenario {
  const parsed = parseScenario(greenhouseFile);
  if (!parsed.success)
    throw new Error(`The greenhouse example is invalid: ${parsed.issues[0]?.message}`);
  return parsed.scenario;
}

/** Half an hour of the greenhouse, simulated once for every spec here. */
const scenario = greenhouse();
const run = simulate(scenario, { durationS: 1800 }).result;
const series: CrossSectionSeries = run.series;
const events: readonly CrossSectionEvent[] = run.events;

async function render(frames = new ManualFrames()) {
  TestBed.configureTestingModule({
    providers: [{ provide: CROSS_SECTION_FRAMES, useValue: frames }],
  });
  const fixture = TestBed.createComponent(CrossSection);
  fixture.componentRef.setInput('scenario', scenario);
  fixture.componentRef.setInput('series', series);
  fixture.componentRef.setInput('events', events);
  await fixture.whenStable();
  return { fixture, frames, root: fixture.nativeElement as HTMLElement };
}

function box(root: HTMLElement, selector: string) {
  const element = root.querySelector(selector);
  if (!element) throw new Error(`Nothing drawn for ${selector}.`);
  const read = (name: string) => Number(element.getAttribute(name));
  return { x: read('x'), y: read('y'), width: read('width'), height: read('height') };
}

function press(root: HTMLElement, key: string, shiftKey = false): void {
  const section = root.querySelector('section.xs');
  section?.dispatchEvent(new KeyboardEvent('keydown', { key, shiftKey, bubbles: true }));
}

/** The middle of the longest stretch of samples where `bed`'s phase channel holds `code`. */
function timeWithPhase(bed: string, code: number): number {
  const values = series.channels.find((c) => c.id === `phase:${bed}`)?.values ?? [];
  let best = { from: -1, to: -1 };
  let from = -1;
  values.forEach((value, i) => {
    if (value !== code) from = -1;
    else if (from < 0) from = i;
    if (from >= 0 && i - from > best.to - best.from) best = { from, to: i };
  });
  if (best.to - best.from < 2) throw new Error(`bed ${bed} never holds phase ${code} for long`);
  return ((series.t_s[best.from] ?? 0) + (series.t_s[best.to] ?? 0)) / 2;
}

describe('CrossSection', () => {
  it('draws a standpipe of height h as h at the scale of the widths, and h·e tall at exaggeration e', async () => {
    const { fixture, root } = await render();
    const bed = scenario.vessels.find((v) => v.id === 'bed-north');
    if (bed?.kind !== 'bed' || bed.shape.type !== 'box') throw new Error('bed-north changed shape');
    const media = box(root, 'g.vessel[data-id="bed-north"] rect.media');
    const pxPerM = media.width / bed.shape.length;
    const standpipe = box(root, 'svg.drawing rect.standpipe[data-id="bed-north"]');
    expect(standpipe.height).toBeCloseTo(bed.drain.standpipe.height * pxPerM, 6);
    expect(standpipe.width).toBeCloseTo(bed.drain.standpipe.outerDiameter * pxPerM, 6);
    // Standpipe and media both stand on the bed floor.
    expect(standpipe.y + standpipe.height).toBeCloseTo(media.y + media.height, 6);

    press(root, 'v');
    await fixture.whenStable();
    const media2 = box(root, 'g.vessel[data-id="bed-north"] rect.media');
    const across = media2.width / bed.shape.length;
    const up =
      box(root, 'svg.drawing rect.standpipe[data-id="bed-north"]').height /
      bed.drain.standpipe.height;
    expect(up / across).toBeCloseTo(2, 9);
  });

  it('fills each vessel to its level in the series at the cursor', async () => {
    const { fixture, root } = await render();
    const level = series.channels.find((c) => c.id === 'level:sump');
    const index = 40;
    fixture.componentRef.setInput('cursorS', series.t_s[index]);
    await fixture.whenStable();
    const sump = scenario.vessels.find((v) => v.id === 'sump');
    if (sump?.shape.type !== 'cylinder') throw new Error('the sump changed shape');
    const pxPerM = box(root, 'rect.water[data-id="sump"]').width / sump.shape.diameter;
    expect(box(root, 'rect.water[data-id="sump"]').height).toBeCloseTo(
      (level?.values[index] ?? 0) * pxPerM,
      1,
    );
  });

  it('labels each bed with the phase its phase channel holds, and the spill number while spilling', async () => {
    const { fixture, root } = await render();
    const tag = (bed: string) =>
      root.querySelector(`svg.drawing g.bed-parts[data-id="${bed}"] tspan.phase`)?.textContent;
    const spill = (bed: string) =>
      root.querySelector(`svg.drawing g.bed-parts[data-id="${bed}"] tspan.spill`)?.textContent;
    for (const [code, word] of [
      [0, 'filling'],
      [1, 'spilling'],
      [3, 'siphoning'],
    ] as const) {
      fixture.componentRef.setInput('cursorS', timeWithPhase('bed-south', code));
      await fixture.whenStable();
      expect(tag('bed-south')).toBe(word);
      expect(root.querySelector('li[data-id="bed-south"] .phase')?.textContent?.trim()).toBe(word);
      if (code === 1) expect(spill('bed-south')).toMatch(/^spill number 0\.\d\d \/ 0\.\d\d$/);
      else expect(spill('bed-south')).toBe('');
    }
  });

  it('draws the water inside the bell: level with the bed while filling, up to the cap while siphoning', async () => {
    const { fixture, root } = await render();
    const bed = scenario.vessels.find((v) => v.id === 'bed-north');
    if (bed?.kind !== 'bed' || bed.drain.type !== 'bell-siphon') throw new Error('no bell');
    // The close-up shows the bed the explain panel explains: pick bed-north there.
    press(root, 'e');
    await fixture.whenStable();
    const picker = root.querySelector<HTMLSelectElement>('tw-explain-panel select');
    if (!picker) throw new Error('The explain panel has no bed picker.');
    picker.value = 'bed-north';
    picker.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    const closeUp = 'svg.close-up g.bed-parts[data-id="bed-north"]';
    const level = series.channels.find((c) => c.id === 'level:bed-north');
    for (const code of [0, 3]) {
      const t = timeWithPhase('bed-north', code);
      fixture.componentRef.setInput('cursorS', t);
      await fixture.whenStable();
      const k = box(root, `${closeUp} rect.standpipe`).width / bed.drain.standpipe.outerDiameter;
      const inside = box(root, `${closeUp} rect.bell-water`).height / k;
      const i = series.t_s.findIndex((time) => time > t) - 1;
      const t0 = series.t_s[i] ?? 0;
      const t1 = series.t_s[i + 1] ?? 0;
      const h0 = level?.values[i] ?? 0;
      const h1 = level?.values[i + 1] ?? 0;
      const bedLevel = h0 + ((h1 - h0) * (t - t0)) / (t1 - t0);
      const expected = code === 3 ? bed.drain.standpipe.height + bed.drain.bell.capGap : bedLevel;
      expect(inside).toBeCloseTo(expected, 3);
      // Above the water the bell holds air: the air space spans the whole bell.
      expect(box(root, `${closeUp} rect.bell-air`).height / k).toBeCloseTo(
        bed.drain.standpipe.height + bed.drain.bell.capGap,
        6,
      );
    }
  });

  it('steps from event to event with the arrow keys and captions the first priming with its spill flow', async () => {
    const { fixture, root } = await render();
    const primed = events.find((e) => e.kind === 'primed');
    if (!primed) throw new Error('the greenhouse never primes in half an hour');
    for (let i = 0; i < 30 && fixture.componentInstance.cursorS() !== primed.t_s; i++) {
      press(root, 'ArrowRight');
      await fixture.whenStable();
    }
    expect(fixture.componentInstance.cursorS()).toBe(primed.t_s);
    const minutes = Math.floor(Math.round(primed.t_s) / 60);
    const seconds = String(Math.round(primed.t_s) % 60).padStart(2, '0');
    const flow = formatQuantity(primed.values?.['spillM3PerS'] ?? 0, 'flow', 'metric');
    const caption = root.querySelector('.caption')?.textContent?.trim();
    expect(caption).toContain(
      `${primed.where} primed at ${minutes}:${seconds} — spill flow reached ${flow}`,
    );
    expect(
      root.querySelector(`svg.drawing g.bed-parts[data-id="${primed.where}"] tspan.phase`)
        ?.textContent,
    ).toBe('priming');
    press(root, 'ArrowLeft');
    await fixture.whenStable();
    expect(fixture.componentInstance.cursorS()).toBeLessThan(primed.t_s);
  });

  it('plays at the chosen speed with Space, speeds up with ], and pauses again with Space', async () => {
    const { fixture, root, frames } = await render();
    press(root, ' ');
    frames.advance(0);
    frames.advance(50);
    frames.advance(50);
    press(root, ' ');
    await fixture.whenStable();
    expect(fixture.componentInstance.cursorS()).toBeCloseTo(0.1 * 60, 9);
    press(root, ']');
    press(root, ' ');
    frames.advance(0);
    frames.advance(100);
    press(root, ' ');
    await fixture.whenStable();
    expect(fixture.componentInstance.cursorS()).toBeCloseTo(6 + 0.1 * 120, 9);
    frames.advance(100);
    expect(fixture.componentInstance.cursorS()).toBeCloseTo(18, 9);
  });

  it('has a title and a description, and turns presentation mode on and off with P and Escape', async () => {
    const { fixture, root } = await render();
    const svg = root.querySelector('svg.drawing');
    const labelled = (svg?.getAttribute('aria-labelledby') ?? '').split(' ');
    expect(labelled.map((id) => root.querySelector(`[id="${id}"]`)?.textContent)).toEqual([
      `Cross-section of ${scenario.name}`,
      expect.stringContaining('to scale'),
    ]);
    press(root, 'p');
    await fixture.whenStable();
    expect(root.classList.contains('presenting')).toBe(true);
    expect(root.querySelector('tw-explain-panel .equation')?.textContent).toBeTruthy();
    press(root, 'Escape');
    await fixture.whenStable();
    expect(root.classList.contains('presenting')).toBe(false);
  });
});
