// The titration curve of one recipe, computed in the browser from its composition: pH against
// strong acid (left) or base (right) added, with the buffering region pK″ ± 1 shaded and the recipe
// itself marked at zero.
import { LinePath } from '@visx/shape';
import { useMemo } from 'react';
import type { BufferSystem, Recipe } from '@shared/chemistry';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { Notice } from '@/components/ui/notice';
import { phColor } from '@/components/ui/ph-scale';
import { titrationOf } from '../utils/curves';

export type TitrationChartProps = { recipe: Recipe; library: readonly BufferSystem[] };

export function TitrationChart({ recipe, library }: TitrationChartProps) {
  const curve = useMemo(() => titrationOf(recipe, library), [recipe, library]);
  if (!curve.ok)
    return <Notice tone="warning">The titration curve could not be computed: {curve.message}</Notice>;
  const pK = recipe.ionization.pKapp;
  const ys = curve.points.map((p) => p.y);
  const c = recipe.totalConc * 1000;
  const title = `Titration of ${recipe.systemName} at pH ${recipe.targetPH.toFixed(2)}`;
  return (
    <ChartFrame
      title={title}
      xLabel="Strong acid (−) or base (+) added (mM)"
      yLabel={`pH at ${recipe.temperatureC} °C`}
      xDomain={[-c, c]}
      yDomain={[Math.max(0, Math.min(...ys, pK - 1) - 0.3), Math.min(14, Math.max(...ys, pK + 1) + 0.3)]}
      legend={[
        { label: 'pH of the recipe', color: chartTheme.accent, mark: 'line' },
        { label: `buffering region pK″ ± 1`, color: chartTheme.accentSoft, mark: 'band' },
        { label: 'the recipe as made', color: phColor(recipe.targetPH), mark: 'dot' },
      ]}
      caption={`${recipe.systemName}, ${c.toPrecision(3)} mM, I = ${recipe.ionicStrength.toPrecision(3)} M; pK″ ${pK.toFixed(2)} (${recipe.ionization.label}). Amounts per litre of buffer; the titrant’s volume is neglected.`}
    >
      {({ x, y, width }) => (
        <>
          <rect
            x={0}
            width={width}
            y={y(pK + 1)}
            height={Math.max(0, y(pK - 1) - y(pK + 1))}
            fill={chartTheme.accentSoft}
            opacity={0.35}
          />
          <line
            x1={0}
            x2={width}
            y1={y(pK)}
            y2={y(pK)}
            stroke={chartTheme.accent}
            strokeDasharray="3 3"
            opacity={0.6}
          />
          <line x1={x(0)} x2={x(0)} y1={0} y2={9999} stroke={chartTheme.axis} />
          <LinePath
            data={curve.points}
            x={(d) => x(d.x)}
            y={(d) => y(d.y)}
            stroke={chartTheme.accent}
            strokeWidth={2}
          />
          <circle
            cx={x(0)}
            cy={y(recipe.targetPH)}
            r={5}
            fill={phColor(recipe.targetPH)}
            stroke="#fff"
            strokeWidth={1.5}
          >
            <title>{`As made: pH ${recipe.targetPH.toFixed(2)}`}</title>
          </circle>
        </>
      )}
    </ChartFrame>
  );
}
