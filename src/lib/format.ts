// Dates and times for display. The platform's Intl is the one date library; the server sends ISO
// 8601 in UTC and the screen shows local time as "2025-03-07 14:05" (sortable, unambiguous).

const pad = (n: number) => String(n).padStart(2, '0');

function parse(iso: string | null | undefined): Date | null {
  if (!iso) return null;
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? null : d;
}

export function formatDate(iso: string | null | undefined, missing = '—'): string {
  const d = parse(iso);
  return d ? `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}` : missing;
}

export function formatDateTime(iso: string | null | undefined, missing = '—'): string {
  const d = parse(iso);
  return d ? `${formatDate(iso)} ${pad(d.getHours())}:${pad(d.getMinutes())}` : missing;
}

export function formatDateTimeSeconds(iso: string | null | undefined, missing = '—'): string {
  const d = parse(iso);
  return d ? `${formatDateTime(iso)}:${pad(d.getSeconds())}` : missing;
}

/** A local calendar day (yyyy-mm-dd from a date input) as the ISO instant it starts or ends at. */
export function dayBoundary(day: string, edge: 'start' | 'end'): string | undefined {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!m) return undefined;
  const d =
    edge === 'start'
      ? new Date(+m[1], +m[2] - 1, +m[3], 0, 0, 0, 0)
      : new Date(+m[1], +m[2] - 1, +m[3], 23, 59, 59, 999);
  return Number.isNaN(d.getTime()) ? undefined : d.toISOString();
}

export const listOf = (items: string[], none = '—') => (items.length === 0 ? none : items.join(', '));
