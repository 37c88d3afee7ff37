// The one chart frame: a titled SVG with linear x and y axes, grid lines, axis titles (with units),
// an optional in-chart legend, and buttons that save the chart as SVG or PNG. Marks are drawn by
// the caller in the plot area through the scales handed to `children`.
import { AxisBottom, AxisLeft } from '@visx/axis';
import { GridColumns, GridRows } from '@visx/grid';
import { Group } from '@visx/group';
import { scaleLinear } from '@visx/scale';
import { useId, useRef, useState, type ReactNode } from 'react';
import { Button } from '../button';
import { ChartLegend, LEGEND_ROW_HEIGHT, legendRows, type ChartLegendItem } from './chart-legend';
import { chartTheme } from './chart-theme';
import { chartFileName, downloadPng, downloadSvg } from './export-chart';
import { useElementWidth } from './use-element-width';

export type LinearScale = ReturnType<typeof scaleLinear<number>>;

/** What the caller draws with: scales into the plot area, and its size in px. */
export type ChartScales = { x: LinearScale; y: LinearScale; width: number; height: number };

export type ChartFrameProps = {
  /** Shown above the plot, names the figure for assistive technology, and names exported files. */
  title: string;
  /** Axis titles with their units, e.g. "pH at 37 °C", "β (mM/pH)". */
  xLabel: string;
  yLabel: string;
  xDomain: [number, number];
  yDomain: [number, number];
  /** Round the domains out to tick values (default true). */
  nice?: boolean;
  /** Height of the plot area and axes in px (default 300; a legend adds its rows); the width follows the container. */
  height?: number;
  xTickFormat?: (value: number) => string;
  yTickFormat?: (value: number) => string;
  legend?: ChartLegendItem[];
  /** A sentence under the chart (not exported). */
  caption?: ReactNode;
  fileName?: string;
  children: (scales: ChartScales) => ReactNode;
};

const margin = { top: 30, right: 18, bottom: 46, left: 62 };

// visx's own defaults place the labels (anchor, offsets); giving props replaces them, so say them all.
const tickText = { fill: chartTheme.inkMuted, fontSize: chartTheme.fontSize, fontFamily: 'inherit' } as const;
const leftTickLabel = () => ({ ...tickText, textAnchor: 'end', dx: '-0.25em', dy: '0.33em' }) as const;
const bottomTickLabel = () => ({ ...tickText, textAnchor: 'middle', dy: '0.25em' }) as const;
const axisTitle = {
  fill: chartTheme.ink,
  fontSize: chartTheme.titleSize,
  fontFamily: 'inherit',
  textAnchor: 'middle',
} as const;

export function ChartFrame(props: ChartFrameProps) {
  const { title, xLabel, yLabel, height = 300, nice = true, legend, caption } = props;
  const box = useRef<HTMLDivElement>(null);
  const svg = useRef<SVGSVGElement>(null);
  const clipId = useId().replace(/:/g, '');
  const width = useElementWidth(box);
  const [exportError, setExportError] = useState<string | null>(null);
  const innerWidth = Math.max(60, width - margin.left - margin.right);
  const innerHeight = Math.max(60, height - margin.top - margin.bottom);
  const rows = legend && legend.length > 0 ? legendRows(legend, width - margin.left - 8) : [];
  const svgHeight = height + (rows.length ? rows.length * LEGEND_ROW_HEIGHT + 16 : 0);
  const x = scaleLinear<number>({ domain: props.xDomain, range: [0, innerWidth], nice });
  const y = scaleLinear<number>({ domain: props.yDomain, range: [innerHeight, 0], nice });
  const fileName = props.fileName ?? chartFileName(title);
  const saveSvg = () => svg.current && downloadSvg(svg.current, fileName);
  const savePng = () => {
    if (!svg.current) return;
    setExportError(null);
    downloadPng(svg.current, fileName).catch((e: Error) => setExportError(e.message));
  };

  return (
    <figure className="rounded border border-line bg-surface p-3" aria-label={title}>
      <div className="no-print mb-1 flex justify-end gap-1.5">
        <Button size="sm" onClick={saveSvg} aria-label={`Save “${title}” as SVG`}>
          SVG
        </Button>
        <Button size="sm" onClick={savePng} aria-label={`Save “${title}” as PNG`}>
          PNG
        </Button>
      </div>
      <div ref={box} className="w-full">
        <svg ref={svg} width={width} height={svgHeight} role="img" aria-label={title} fontFamily="inherit">
          <text x={margin.left} y={16} fontSize={13} fontWeight={600} fill={chartTheme.ink}>
            {title}
          </text>
          <defs>
            <clipPath id={clipId}>
              <rect width={innerWidth} height={innerHeight} />
            </clipPath>
          </defs>
          <Group left={margin.left} top={margin.top}>
            <GridRows scale={y} width={innerWidth} stroke={chartTheme.grid} numTicks={6} />
            <GridColumns scale={x} height={innerHeight} stroke={chartTheme.grid} numTicks={8} />
            <g clipPath={`url(#${clipId})`}>
              {props.children({ x, y, width: innerWidth, height: innerHeight })}
            </g>
            <AxisLeft
              scale={y}
              numTicks={6}
              stroke={chartTheme.axis}
              tickStroke={chartTheme.axis}
              tickFormat={props.yTickFormat ? (v) => props.yTickFormat!(Number(v)) : undefined}
              tickLabelProps={leftTickLabel}
              label={yLabel}
              labelOffset={40}
              labelProps={axisTitle}
            />
            <AxisBottom
              top={innerHeight}
              scale={x}
              numTicks={8}
              stroke={chartTheme.axis}
              tickStroke={chartTheme.axis}
              tickFormat={props.xTickFormat ? (v) => props.xTickFormat!(Number(v)) : undefined}
              tickLabelProps={bottomTickLabel}
              label={xLabel}
              labelOffset={14}
              labelProps={axisTitle}
            />
          </Group>
          {rows.length > 0 && <ChartLegend rows={rows} x={margin.left} y={height + 12} />}
        </svg>
      </div>
      {caption && <figcaption className="mt-1 text-sm text-ink-muted">{caption}</figcaption>}
      {exportError && <p className="mt-1 text-sm text-danger-600">{exportError}</p>}
    </figure>
  );
}
