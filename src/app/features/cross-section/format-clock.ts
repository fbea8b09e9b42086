/**
 * Writes a time since the start of a run as a clock: "6:42" under an hour, "1:02:03" from an hour
 * on; `tenths` adds a decimal ("6:42.5") for a cursor that stops between whole seconds.
 */
export function formatClock(timeS: number, tenths = false): string {
  const safe = Math.max(0, timeS);
  const wholeTenths = Math.round(safe * 10);
  const whole = tenths ? Math.floor(wholeTenths / 10) : Math.round(safe);
  const hours = Math.floor(whole / 3600);
  const minutes = Math.floor((whole % 3600) / 60);
  const seconds = whole % 60;
  const tail = tenths ? `.${wholeTenths % 10}` : '';
  const ss = `${String(seconds).padStart(2, '0')}${tail}`;
  return hours > 0 ? `${hours}:${String(minutes).padStart(2, '0')}:${ss}` : `${minutes}:${ss}`;
}
