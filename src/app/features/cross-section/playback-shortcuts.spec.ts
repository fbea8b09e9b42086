import { shortcutFor } from './playback-shortcuts';

function key(key: string, target: HTMLElement, init: KeyboardEventInit = {}) {
  const event = new KeyboardEvent('keydown', { key, bubbles: true, ...init });
  Object.defineProperty(event, 'target', { value: target });
  return shortcutFor(event);
}

describe('shortcutFor', () => {
  const section = document.createElement('section');

  it('maps the playback keys, case-insensitively for letters', () => {
    expect(key(' ', section)).toBe('toggle-play');
    expect(key('K', section)).toBe('toggle-play');
    expect(key('ArrowRight', section)).toBe('next-event');
    expect(key('ArrowLeft', section)).toBe('previous-event');
    expect(key('ArrowRight', section, { shiftKey: true })).toBe('forward');
    expect(key(']', section)).toBe('faster');
    expect(key('P', section)).toBe('present');
    expect(key('Escape', section)).toBe('leave');
    expect(key('x', section)).toBeNull();
  });

  it('leaves keys to the control they were pressed in, and ignores modified keys', () => {
    expect(key('ArrowRight', document.createElement('input'))).toBeNull();
    expect(key('e', document.createElement('select'))).toBeNull();
    expect(key(' ', document.createElement('button'))).toBeNull();
    expect(key('ArrowRight', document.createElement('button'))).toBe('next-event');
    expect(key('p', section, { ctrlKey: true })).toBeNull();
  });
});
