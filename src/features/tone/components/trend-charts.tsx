import { formatDate } from '@shared/domain/format';
import { todayIso } from '@shared/domain/tone/check-date';
import { lazy, Suspense, useEffect, type ComponentType } from 'react';
import type { ToneTrendResponse } from '@shared/types/tone';
import { ratePerYear } from '@shared/domain/tone/numbers';
import { projectionWords } from '@shared/domain/tone/projection-words';
import { useNearScreen } from '@/lib/use-near-screen';
import { patchLabel } from './format';
import type { TrendLineProps } from './trend-line';

// recharts is large: its code is not part of the page's first load. It is fetched once the
// page is idle, and the charts draw when they come near the screen or the page is printed.
const loadTrendLine = () => import('./trend-line');
const LazyTrendLine = lazy(loadTrendLine);
let loadedTrendLine: ComponentType<TrendLineProps> | null = null;

/**
 * Printing cannot wait for code to arrive: the browser lays out the printed pages straight
 * after `beforeprint`, so a chart whose code is still loading prints blank. Loaded ahead,
 * the charts draw in that moment.
 */
function useTrendLineLoadedWhenIdle() {
  useEffect(() => {
    if (loadedTrendLine) return;
    const load = () =>
      void loadTrendLine().then((module) => {
        loadedTrendLine = module.default;
      });
    if (typeof window.requestIdleCallback !== 'function') {
      const timer = window.setTimeout(load, 1000);
      return () => window.clearTimeout(timer);
    }
    const idle = window.requestIdleCallback(load);
    return () => window.cancelIdleCallback(idle);
  }, []);
}

/** A chart's place, its height kept from the start (nothing below moves when it draws). */
function Chart(props: TrendLineProps) {
  const [ref, near] = useNearScreen<HTMLDivElement>();
  const TrendLine = loadedTrendLine ?? LazyTrendLine;
  return (
    <div ref={ref} className="h-40" aria-hidden="true">
      {near && (
        <Suspense fallback={null}>
          <TrendLine {...props} />
        </Suspense>
      )}
    </div>
  );
}

const time = (date: string) => Date.parse(`${date}T00:00:00Z`);

/** ΔE00 against the baseline over time, one small chart per patch, thresholds drawn. */
export function TrendCharts({ trend }: { trend: ToneTrendResponse }) {
  useTrendLineLoadedWhenIdle();
  const { watchDE00, noticeableDE00, projectionYears } = trend.thresholds;
  const top = Math.max(
    noticeableDE00 * 1.25,
    ...trend.patches.flatMap((p) => p.series.map((point) => point.dE00 * 1.1)),
  );
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {trend.patches.map((patch) => {
        const data = patch.series.map((point) => ({ t: time(point.checkedOn), dE00: point.dE00 }));
        const slope = patch.slopePerYear?.dE00;
        const projection = projectionWords({
          latestDE00: patch.series.at(-1)?.dE00 ?? 0,
          projectedOn: patch.projectedNoticeableOn,
          hasTrend: slope !== undefined,
          noticeableDE00,
          horizonYears: projectionYears,
          today: todayIso(),
        });
        return (
          <figure key={patch.patch} className="rounded border border-paper-edge bg-white/60 p-2">
            <figcaption className="mb-1 text-sm">
              <span className="font-semibold">{patchLabel(patch.patch)}</span>
              <span className="text-ink-faint">
                {slope === undefined
                  ? ' · fewer than 3 checks: no trend yet'
                  : ` · ΔE00 ${ratePerYear(slope)}`}
                {projection && ` · ${projection}`}
              </span>
            </figcaption>
            <Chart data={data} top={top} watchDE00={watchDE00} noticeableDE00={noticeableDE00} />
            <p className="sr-only">
              ΔE00 at each check:{' '}
              {patch.series
                .map((p) => `${formatDate(p.checkedOn)} ${p.dE00.toFixed(2)}`)
                .join(', ')}
            </p>
          </figure>
        );
      })}
    </div>
  );
}
