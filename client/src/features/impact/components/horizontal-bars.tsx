import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { COLOURS } from './display';

/**
 * A horizontal bar chart by category (or barrier): one or more series, a whole-number or percentage axis, and a
 * bar that leads to its records when `onPick` is given.
 */
export function HorizontalBars<T extends object>({
  data,
  labelKey,
  labelWidth = 140,
  bars,
  percentAxis = false,
  legend = false,
  onPick,
}: {
  data: T[];
  labelKey: keyof T & string;
  labelWidth?: number;
  bars: { dataKey: keyof T & string; name: string; fill: string }[];
  percentAxis?: boolean;
  legend?: boolean;
  onPick?: (row: T) => void;
}) {
  return (
    <ResponsiveContainer width="100%" height={260}>
      <BarChart
        data={data}
        layout="vertical"
        margin={{ top: 0, right: 12, bottom: 0, left: 0 }}
        accessibilityLayer={false}
      >
        <CartesianGrid horizontal={false} stroke={COLOURS.grid} />
        {percentAxis ? (
          <XAxis type="number" domain={[0, 100]} unit="%" tick={{ fontSize: 12 }} />
        ) : (
          <XAxis type="number" allowDecimals={false} tick={{ fontSize: 12 }} />
        )}
        <YAxis type="category" dataKey={labelKey as never} width={labelWidth} tick={{ fontSize: 11, maxLines: 2 }} />
        <Tooltip
          cursor={{ fill: 'rgba(35,57,93,0.06)' }}
          {...(percentAxis ? { formatter: (v: unknown, name: unknown) => [`${v}%`, String(name)] } : {})}
        />
        {legend && (
          <Legend
            wrapperStyle={{ fontSize: 12 }}
            itemSorter={null}
            formatter={(value) => <span className="text-ink">{value}</span>}
          />
        )}
        {bars.map((b) => (
          <Bar
            key={b.dataKey}
            isAnimationActive={false}
            dataKey={b.dataKey as never}
            name={b.name}
            fill={b.fill}
            radius={[0, 3, 3, 0]}
            maxBarSize={28}
            {...(onPick ? { cursor: 'pointer', onClick: (_: unknown, i: number) => onPick(data[i]) } : {})}
          />
        ))}
      </BarChart>
    </ResponsiveContainer>
  );
}
