const pad = (n: number): string => String(n).padStart(2, '0');

/**
 * A moment as "YYYY-MM-DD HH:MM" in local time: ISO 8601 order, like the report's date (issue 16 §5:
 * the recovery offer and browser mode's recent list say dates the same way).
 */
export function localDateTime(at: Date): string {
  if (Number.isNaN(at.getTime())) return 'an unknown time';
  return `${localDate(at)} ${pad(at.getHours())}:${pad(at.getMinutes())}`;
}

/** Today's date as YYYY-MM-DD in local time (the engine takes the date as an input). */
export function localDate(now: Date = new Date()): string {
  const pad = (n: number): string => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
