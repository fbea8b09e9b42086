import { type FrameScheduler, PlaybackController } from './playback-controller';

class ManualFrames implements FrameScheduler {
  nowMs = 0;
  private waiting: ((now: number) => void) | null = null;
  request(callback: (now: number) => void): number {
    this.waiting = callback;
    return 1;
  }
  cancel(): void {
    this.waiting = null;
  }
  now(): number {
    return this.nowMs;
  }
  advance(ms: number): void {
    this.nowMs += ms;
    const callback = this.waiting;
    this.waiting = null;
    callback?.(this.nowMs);
  }
  get pending(): boolean {
    return this.waiting !== null;
  }
}

function controller() {
  const frames = new ManualFrames();
  const drawn: [number, number][] = [];
  const playback = new PlaybackController(frames, (t, step) => drawn.push([t, step]));
  playback.setRange(0, 600);
  return { frames, drawn, playback };
}

describe('PlaybackController', () => {
  it('advances by wall time × speed each frame and draws every frame', () => {
    const { frames, drawn, playback } = controller();
    playback.setSpeed(60);
    playback.play();
    frames.advance(16);
    frames.advance(16);
    expect(playback.time).toBeCloseTo(2 * 0.016 * 60, 12);
    expect(drawn.at(-1)).toEqual([playback.time, 0.016]);
  });

  it('stops at the end of the run and starts over from the beginning on play', () => {
    const { frames, playback } = controller();
    playback.setSpeed(600);
    playback.seek(590);
    playback.play();
    frames.advance(100);
    expect(playback.time).toBe(600);
    expect(playback.playing()).toBe(false);
    expect(frames.pending).toBe(false);
    playback.play();
    expect(playback.time).toBe(0);
  });

  it('counts a long gap between frames (a hidden tab) as a tenth of a second', () => {
    const { frames, playback } = controller();
    playback.setSpeed(10);
    playback.play();
    frames.advance(5000);
    expect(playback.time).toBeCloseTo(1, 12);
  });

  it('steps to the next and previous event time and pauses there', () => {
    const { frames, playback } = controller();
    const times = [30, 30.5, 200];
    playback.play();
    frames.advance(10);
    expect(playback.stepTo(times, 1)).toBe(0);
    expect(playback.time).toBe(30);
    expect(playback.playing()).toBe(false);
    expect(playback.stepTo(times, 1)).toBe(1);
    expect(playback.stepTo(times, 1)).toBe(2);
    expect(playback.stepTo(times, 1)).toBe(-1);
    expect(playback.time).toBe(200);
    expect(playback.stepTo(times, -1)).toBe(1);
    expect(playback.coarseTimeS()).toBe(30.5);
  });

  it('offers speeds from 1× to 600× and snaps a wanted speed to the nearest', () => {
    const { playback } = controller();
    playback.setSpeed(550);
    expect(playback.speed()).toBe(600);
    playback.stepSpeed(1);
    expect(playback.speed()).toBe(600);
    playback.setSpeed(0.5);
    expect(playback.speed()).toBe(1);
    playback.stepSpeed(-1);
    expect(playback.speed()).toBe(1);
    playback.stepSpeed(1);
    expect(playback.speed()).toBe(2);
  });

  it('updates the coarse time at most every 100 ms while playing, and at once on a seek', () => {
    const { frames, playback } = controller();
    playback.setSpeed(1);
    playback.play();
    frames.advance(60);
    expect(playback.coarseTimeS()).toBe(0);
    frames.advance(60);
    expect(playback.coarseTimeS()).toBeCloseTo(0.12, 12);
    frames.advance(40);
    expect(playback.coarseTimeS()).toBeCloseTo(0.12, 12);
    frames.advance(70);
    expect(playback.coarseTimeS()).toBeCloseTo(0.23, 12);
    playback.seek(42);
    expect(playback.coarseTimeS()).toBe(42);
  });
});
