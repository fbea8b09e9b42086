/** What a key asks the cross-section to do. */
export type ShortcutAction =
  | 'toggle-play'
  | 'next-event'
  | 'previous-event'
  | 'forward'
  | 'back'
  | 'faster'
  | 'slower'
  | 'start'
  | 'end'
  | 'captions'
  | 'explain'
  | 'exaggerate'
  | 'present'
  | 'leave';

/** The keys, for the help list: key names and what they do. */
export const SHORTCUTS: readonly { readonly keys: string; readonly does: string }[] = [
  { keys: 'Space or K', does: 'play or pause' },
  { keys: '→ / ←', does: 'next / previous event' },
  { keys: 'Shift + → / ←', does: 'one simulated minute on / back' },
  { keys: '] / [', does: 'faster / slower' },
  { keys: 'Home / End', does: 'start / end of the run' },
  { keys: 'C', does: 'captions on or off' },
  { keys: 'E', does: 'explain panel on or off' },
  { keys: 'V', does: 'next vertical exaggeration' },
  { keys: 'P', does: 'presentation mode; Esc leaves it' },
];

const PLAIN: Readonly<Record<string, ShortcutAction>> = {
  ' ': 'toggle-play',
  k: 'toggle-play',
  ArrowRight: 'next-event',
  ArrowLeft: 'previous-event',
  ']': 'faster',
  '[': 'slower',
  Home: 'start',
  End: 'end',
  c: 'captions',
  e: 'explain',
  v: 'exaggerate',
  p: 'present',
  Escape: 'leave',
};

/**
 * The action of a key press, or null when the key is not a shortcut or belongs to the control it
 * was pressed in (a slider's arrows, a list's letters, a button's Space).
 */
export function shortcutFor(event: KeyboardEvent): ShortcutAction | null {
  if (event.ctrlKey || event.metaKey || event.altKey) return null;
  const target = event.target as HTMLElement | null;
  const tag = target?.tagName?.toLowerCase() ?? '';
  if (tag === 'input' || tag === 'select' || tag === 'textarea') return null;
  if (tag === 'button' && (event.key === ' ' || event.key === 'Enter')) return null;
  if (event.shiftKey && event.key === 'ArrowRight') return 'forward';
  if (event.shiftKey && event.key === 'ArrowLeft') return 'back';
  const key = event.key.length === 1 ? event.key.toLowerCase() : event.key;
  return PLAIN[key] ?? null;
}
