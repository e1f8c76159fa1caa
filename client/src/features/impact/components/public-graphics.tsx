import { Area, AreaChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { PublicImpact } from '../api/types';
import { useT } from '../../../lib/i18n';
import { COLOURS, useFormats } from './display';
import { HorizontalBars } from './horizontal-bars';

/** The public page's two drawings; their own chunk, with the chart library, loaded when they come into view. */
export function KgByMonthGraphic({ months }: { months: { month: string; label: string; kg: number }[] }) {
  const t = useT();
  const { oneDp } = useFormats();
  return (
    <ResponsiveContainer width="100%" height={260}>
      <AreaChart data={months} margin={{ top: 8, right: 8, bottom: 0, left: -12 }} accessibilityLayer={false}>
        <CartesianGrid vertical={false} stroke={COLOURS.grid} />
        <XAxis dataKey="label" tick={{ fontSize: 12 }} interval="preserveStartEnd" />
        <YAxis tick={{ fontSize: 12 }} width={44} />
        <Tooltip formatter={(v) => [`${oneDp.format(Number(v))} kg`, t('figures.public.keptOut')]} />
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
  const t = useT();
  return (
    <HorizontalBars
      data={top}
      labelKey="name"
      legend
      bars={[
        { dataKey: 'items', name: t('figures.public.broughtIn'), fill: COLOURS.advice },
        { dataKey: 'fixed', name: t('figures.col.fixed'), fill: COLOURS.fixed },
      ]}
    />
  );
}
