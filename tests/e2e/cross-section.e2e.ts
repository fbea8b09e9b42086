import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { type Page, expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/seed';
import { watchPage } from './page-watch';

const artifacts = join(import.meta.dirname, 'artifacts');

interface ApiEvent {
  t_s: number;
  kind: string;
  where: string;
  values?: Record<string, number | null>;
}

/** "6:42" under an hour, "1:02:03" beyond; with tenths when asked (as the playback bar shows). */
function clock(timeS: number, tenths: boolean): string {
  const wholeTenths = Math.round(timeS * 10);
  const whole = tenths ? Math.floor(wholeTenths / 10) : Math.round(timeS);
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = `${String(whole % 60).padStart(2, '0')}${tenths ? `.${wholeTenths % 10}` : ''}`;
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${s}` : `${m}:${s}`;
}

async function signInAsDemo(page: Page): Promise<void> {
  const demo = DEMO_ACCOUNTS.find((account) => account.email === 'demo@tidewright.test');
  if (!demo) throw new Error('The demo seed has no demo@tidewright.test account.');
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demo.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/systems$/);
}

/** Opens the greenhouse system and runs it; resolves with the run's id on its page. */
async function runGreenhouse(page: Page): Promise<string> {
  await page.locator('table.systems').waitFor();
  await page
    .getByRole('link', { name: /greenhouse/i })
    .first()
    .click();
  await expect(page).toHaveURL(/\/systems\/[0-9a-f-]{36}$/);
  await page.getByRole('button', { name: /^(Run|Save and run)$/ }).click();
  await expect(page).toHaveURL(/\/runs\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  return page.url().split('/').pop() ?? '';
}

/** Frame intervals of the page for `ms` (requestAnimationFrame), as median, p95 and share > 20 ms. */
async function frameIntervals(page: Page, ms: number) {
  return page.evaluate(
    (duration) =>
      new Promise<{ frames: number; medianMs: number; p95Ms: number; over20: number }>(
        (resolve) => {
          const gaps: number[] = [];
          let last = performance.now();
          const end = last + duration;
          const tick = (now: number) => {
            gaps.push(now - last);
            last = now;
            if (now < end) requestAnimationFrame(tick);
            else {
              gaps.sort((a, b) => a - b);
              const at = (q: number) => gaps[Math.floor(q * (gaps.length - 1))] ?? 0;
              resolve({
                frames: gaps.length,
                medianMs: at(0.5),
                p95Ms: at(0.95),
                over20: gaps.filter((g) => g > 20).length / gaps.length,
              });
            }
          };
          requestAnimationFrame(tick);
        },
      ),
    ms,
  );
}

test('plays the greenhouse run in the cross-section, steps to the first priming and presents it', async ({
  page,
}) => {
  test.setTimeout(180_000);
  mkdirSync(artifacts, { recursive: true });
  await page.setViewportSize({ width: 1366, height: 900 });
  const watch = watchPage(page, ['/api/auth/me']);
  const seriesLoads: { bytes: number; ms: number }[] = [];
  page.on('requestfinished', async (request) => {
    if (!request.url().includes('/series?channels=')) return;
    const body = await (await request.response())?.body();
    seriesLoads.push({ bytes: body?.length ?? 0, ms: request.timing().responseEnd });
  });
  await signInAsDemo(page);
  const runId = await runGreenhouse(page);

  const section = page.locator('tw-cross-section');
  await expect(section.locator('svg.drawing rect.standpipe')).toHaveCount(3, { timeout: 30_000 });
  await expect(section.locator('svg.drawing title')).toContainText('Cross-section of');

  // Play at 600× and measure: the page's frame intervals, layouts and style recalculations per
  // frame from the browser's own counters, and the component's own work per frame.
  await section.getByLabel('Speed').selectOption('600');
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Performance.enable');
  const metrics = async () =>
    Object.fromEntries(
      (await cdp.send('Performance.getMetrics')).metrics.map((m) => [m.name, m.value]),
    ) as Record<string, number>;
  await section.getByRole('button', { name: 'Play' }).click();
  await page.waitForTimeout(500);
  const before = await metrics();
  const frames = await frameIntervals(page, 4000);
  const after = await metrics();
  await section.getByRole('button', { name: 'Pause' }).click();
  const own = await page.evaluate(() => {
    const marks = performance.getEntriesByName('tw-cross-section-frames') as PerformanceMark[];
    return marks.at(-1)?.detail as { frames: number; medianMs: number; p95Ms: number };
  });
  const per = (name: string) => ((after[name] ?? 0) - (before[name] ?? 0)) / frames.frames;
  const figures = {
    seriesLoad: seriesLoads[0] ?? null,
    speed: 600,
    viewport: '1366x900',
    pageFrames: frames,
    componentPaint: own,
    layoutsPerFrame: per('LayoutCount'),
    styleRecalcsPerFrame: per('RecalcStyleCount'),
    layoutMsPerFrame: per('LayoutDuration') * 1000,
    styleMsPerFrame: per('RecalcStyleDuration') * 1000,
    scriptMsPerFrame: per('ScriptDuration') * 1000,
    taskMsPerFrame: per('TaskDuration') * 1000,
  };
  writeFileSync(join(artifacts, 'cross-section-frames.json'), JSON.stringify(figures, null, 2));
  console.log(`cross-section frame figures: ${JSON.stringify(figures)}`);
  expect(own.frames).toBeGreaterThan(30);
  // No layout thrash: at most one layout per frame for the moving drawing, plus the read-outs'
  // ten updates a second; never several forced layouts within a frame.
  expect(figures.layoutsPerFrame).toBeLessThan(1.5);
  const playedTo = await section.locator('output.time').innerText();
  expect(playedTo).not.toBe('0:00.0');

  // Back to the start, then step event by event to the first priming.
  const run = (await (await page.request.get(`/api/runs/${runId}`)).json()) as {
    events: ApiEvent[];
  };
  const primed = run.events.find((e) => e.kind === 'primed');
  if (!primed) throw new Error('The greenhouse run has no priming.');
  await section.locator('section.xs').focus();
  await page.keyboard.press('Home');
  const caption = section.locator('p.caption');
  const time = section.locator('output.time');
  await expect(time).toHaveText('0:00.0');
  for (let i = 0; i < 40; i++) {
    const before = await time.innerText();
    await page.keyboard.press('ArrowRight');
    // The page shows a step on its next render: wait for the new time before reading the caption.
    await expect(time).not.toHaveText(before);
    if ((await caption.innerText()).includes(' primed at ')) break;
  }
  await expect(caption).toContainText(`${primed.where} primed at ${clock(primed.t_s, false)}`);
  await expect(caption).toContainText('spill flow reached');
  await expect(time).toHaveText(clock(primed.t_s, true));
  await expect(
    section.locator(`svg.drawing g.bed-parts[data-id="${primed.where}"] tspan.phase`),
  ).toHaveText('priming');
  // The charts' cursor follows the cross-section's time.
  await expect(page.locator('tw-time-series-chart line.cursor').first()).toBeAttached();
  await section.screenshot({ path: join(artifacts, 'cross-section.png') });

  await section.getByRole('button', { name: 'Present' }).click();
  await expect(section).toHaveClass(/presenting/);
  await expect(section.locator('tw-explain-panel .equation')).toContainText('Q_prime');
  await page.screenshot({ path: join(artifacts, 'cross-section-presentation.png') });
  await page.keyboard.press('Escape');
  await expect(section).not.toHaveClass(/presenting/);

  expect(watch.farRequests).toEqual([]);
  expect(watch.errors).toEqual([]);
});
