// How amounts, times and depots read on screen. Money goes through the engine's exact formatter;
// grouping is added to the digits, never through floating point.

import { formatMinor, type Minor } from '../../engine/index';

/** "1,234.50" from 123450 minor units; "−" sign kept as a plain hyphen-minus for copy-paste. */
export function formatMoney(valueMinor: number, exponent = 2): string {
  if (!Number.isFinite(valueMinor)) return '—';
  const plain = formatMinor(valueMinor as Minor, exponent);
  const negative = plain.startsWith('-');
  const body = negative ? plain.slice(1) : plain;
  const [whole, fraction] = body.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${negative ? '-' : ''}${grouped}${fraction !== undefined ? `.${fraction}` : ''}`;
}

/** Money with its ISO 4217 code, e.g. "EUR 1,234.50". */
export function formatMoneyWithCode(valueMinor: number, currency: string, exponent = 2): string {
  return Number.isFinite(valueMinor) ? `${currency} ${formatMoney(valueMinor, exponent)}` : '—';
}

/** "7 h 05 min" from 425; "—" when unknown. */
export function formatDriveMinutes(minutes: number): string {
  if (!Number.isFinite(minutes)) return '—';
  const whole = Math.round(minutes);
  const h = Math.floor(whole / 60);
  const m = whole % 60;
  return h > 0 ? `${h} h ${String(m).padStart(2, '0')} min` : `${m} min`;
}

/** "RTM · Rotterdam Maasvlakte yard". */
export function depotLabel(id: string, name: string): string {
  return name && name !== id ? `${id} · ${name}` : id;
}

/** Milliseconds for the status line: one decimal below 10 ms, whole above. */
export function formatMs(ms: number): string {
  return ms < 10 ? `${ms.toFixed(1)} ms` : `${Math.round(ms)} ms`;
}
