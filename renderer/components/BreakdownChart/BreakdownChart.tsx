// A small bar chart of a route's cost components (tolls, fuel, fees against rebates, and the net),
// drawn as plain SVG. Bars carry their value as text and rebates are hatched, so colour is never
// the only cue.

import { netCost } from '../../../engine/index';
import { formatMoney } from '../../model/format';

export interface BreakdownChartProps {
  tollMinor: number;
  fuelMinor: number;
  feesMinor: number;
  rebateMinor: number;
  exponent: number;
  currency: string;
}

const WIDTH = 300;
const BAR = 18;
const GAP = 6;
const LABEL = 58;
const VALUE = 78;

export function BreakdownChart({ tollMinor, fuelMinor, feesMinor, rebateMinor, exponent, currency }: BreakdownChartProps) {
  const net = netCost(tollMinor, fuelMinor, feesMinor, rebateMinor, 'net cost of the route');
  const bars = [
    { label: 'Tolls', value: tollMinor, cls: 'lw-bar-toll' },
    { label: 'Fuel', value: fuelMinor, cls: 'lw-bar-fuel' },
    { label: 'Fees', value: feesMinor, cls: 'lw-bar-fees' },
    { label: 'Rebates', value: -rebateMinor, cls: 'lw-bar-rebate' },
    { label: 'Net', value: net, cls: 'lw-bar-net' },
  ];
  const largest = Math.max(1, ...bars.map((b) => Math.abs(b.value)));
  const plot = WIDTH - LABEL - VALUE;
  const hasNegative = bars.some((b) => b.value < 0);
  // Zero line sits a third in when some bars go negative, so rebates have room to the left.
  const zero = LABEL + (hasNegative ? plot / 3 : 0);
  const scale = (hasNegative ? (plot * 2) / 3 : plot) / largest;
  const height = bars.length * (BAR + GAP);
  return (
    <svg className="lw-chart" viewBox={`0 0 ${WIDTH} ${height}`} width={WIDTH} height={height} role="img" aria-label={`Cost breakdown in ${currency}: ${bars.map((b) => `${b.label} ${formatMoney(b.value, exponent)}`).join(', ')}`}>
      <defs>
        <pattern id="lw-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" fill="#cfe8d6" />
          <line x1="0" y1="0" x2="0" y2="6" stroke="#2f7d4a" strokeWidth="3" />
        </pattern>
      </defs>
      {bars.map((b, i) => {
        const y = i * (BAR + GAP);
        const length = Math.abs(b.value) * scale;
        const x = b.value >= 0 ? zero : zero - length;
        return (
          <g key={b.label}>
            <text x={0} y={y + BAR * 0.72} className="lw-chart-label">
              {b.label}
            </text>
            <rect x={x} y={y} width={Math.max(length, 1)} height={BAR} className={b.cls} fill={b.cls === 'lw-bar-rebate' ? 'url(#lw-hatch)' : undefined} />
            <text x={WIDTH} y={y + BAR * 0.72} textAnchor="end" className="lw-chart-value">
              {formatMoney(b.value, exponent)}
            </text>
          </g>
        );
      })}
      <line x1={zero} x2={zero} y1={0} y2={height} stroke="#33434a" strokeWidth={1} />
    </svg>
  );
}
