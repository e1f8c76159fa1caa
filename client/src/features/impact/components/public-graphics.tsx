import { Area, AreaChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { PublicImpact } from '../api/types';
import { COLOURS, oneDp } from './display';
import { HorizontalBars } from './horizontal-bars';

/** The public page's two drawings; their own chunk, with the chart library, loaded when they come into view. */
export function KgByMonthGraphic({ months }: { months: { month: string; label: string; kg: number }[] }) {
  return (
    <ResponsiveContainer width="100%" height={260}>
      <AreaChart data={months} margin={{ top: 8, right: 8, bottom: 0, left: -12 }} accessibilityLayer={false}>
        <CartesianGrid vertical={false} stroke={COLOURS.grid} />
        <XAxis dataKey="label" tick={{ fontSize: 12 }} interval="preserveStartEnd" />
        <YAxis tick={{ fontSize: 12 }} width={44} />
        <Tooltip formatter={(v) => [`${oneDp.format(Number(v))} kg`, 'Kept out of the bin']} />
        <Area
          isAnimationActive={false}
          type="monotone"
          dataKey="kg"
          stroke={COLOURS.fixed}
          strokeWidth={2}
          fill={COLOURS.fixed}
          fillOpacity={0.25}
        />
      </AreaChart>
    </ResponsiveContainer>
  );
}

export function TopCategoriesGraphic({ top }: { top: PublicImpact['byCategory'] }) {
  return (
    <HorizontalBars
      data={top}
      labelKey="name"
      legend
      bars={[
        { dataKey: 'items', name: 'Brought in', fill: COLOURS.advice },
        { dataKey: 'fixed', name: 'Fixed', fill: COLOURS.fixed },
      ]}
    />
  );
}
