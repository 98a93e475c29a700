import type { DatasetFit } from '#shared/schemas/datasets';
import { Banner } from '../../../components/ui/banner';
import { histogramSpec, hourProfileSpec, weekHeatSpec } from '../lib/fit-charts';
import { verdictWords } from '../lib/verdict-words';
import { VegaFigure } from './vega-figure';

const n = (v: number, d = 1) => v.toLocaleString('en', { maximumFractionDigits: d, minimumFractionDigits: d });
const minutes = (s: number) => `${n(s / 60, 2)} min`;

function Fact({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-md border border-rule bg-sheet px-4 py-3">
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="mt-0.5 text-lg font-semibold tabular-nums">{value}</dd>
      {note && <dd className="text-xs text-ink-soft">{note}</dd>}
    </div>
  );
}

/** What was fitted: demand (rates, peak, profile) and service (mean, SCV, percentiles, shape). */
export function FitView({ fit }: { fit: DatasetFit }) {
  const d = fit.demand;
  const s = fit.service;
  // The exponential verdict has its own banner; the cautions list keeps the other warnings.
  const warnings = [...d.warnings, ...(s?.warnings ?? []).filter((w) => w.code !== 'not_exponential' && w.code !== 'exponential_doubtful')];
  const verdict = s ? verdictWords(s.goodnessOfFit, s.scv) : null;
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="demand-title">
        <h2 id="demand-title" className="text-lg font-semibold">
          Demand
        </h2>
        <dl className="mt-3 grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          <Fact label="Arrivals" value={d.totalArrivals.toLocaleString('en')} note={`${fit.rows.toLocaleString('en')} rows over ${n(d.hoursObserved, 0)} hours`} />
          <Fact label="Average rate" value={`${n(d.overall.ratePerHour, 2)} per hour`} note={`95 %: ${n(d.overall.lowerPerHour, 2)}–${n(d.overall.upperPerHour, 2)} (exact Poisson)`} />
          <Fact label={`Peak ${d.intervalMinutes}-minute interval`} value={d.peak ? `${n(d.peak.ratePerHour, 1)} per hour` : '—'} note={d.peak ? `${d.peak.start.replace('T', ' ')} (${d.timeZone}); 95 %: ${n(d.peak.lowerPerHour, 1)}–${n(d.peak.upperPerHour, 1)}` : undefined} />
          <Fact label="Variation between intervals" value={`index ${n(d.dispersion.index, 2)}`} note={d.dispersion.verdict} />
        </dl>
        <div className="mt-6 grid gap-6">
          <VegaFigure spec={hourProfileSpec(d.profile)} description="Bar chart of mean arrivals per hour for each hour of the day" caption={`Mean arrivals per hour by hour of day, ${d.timeZone}.`} />
          <VegaFigure spec={weekHeatSpec(d.profile)} description="Grid of arrival rates by day of week and hour of day" caption="Arrivals per hour by day of week and hour; blank cells were not observed." />
        </div>
      </section>
      {s && verdict && (
        <section aria-labelledby="service-title">
          <h2 id="service-title" className="text-lg font-semibold">
            Service time
          </h2>
          <dl className="mt-3 grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
            <Fact label="Mean" value={minutes(s.meanSeconds)} note={`95 %: ${minutes(s.meanInterval.lower)}–${minutes(s.meanInterval.upper)}; ${s.count.toLocaleString('en')} services`} />
            <Fact label="SCV" value={n(s.scv, 2)} note="1 for exponential times, 0 for constant ones" />
            <Fact label="Median · 90th · 95th percentile" value={`${n(s.percentiles.p50 / 60, 1)} · ${n(s.percentiles.p90 / 60, 1)} · ${n(s.percentiles.p95 / 60, 1)} min`} />
            <Fact label="Services per hour, one server" value={n(s.serviceRatePerHour, 2)} />
          </dl>
          <div className="mt-4">
            <Banner tone={verdict.tone} title="Is the service time exponential?">
              {verdict.text}
            </Banner>
          </div>
          <div className="mt-6">
            <VegaFigure spec={histogramSpec(s.histogram)} description="Histogram of service times with the fitted exponential density drawn over it" caption="Bars: observed service times. Line: the exponential distribution with the same mean." />
          </div>
        </section>
      )}
      {fit.handling && <p className="text-sm">Mean handling time: {minutes(fit.handling.meanSeconds)} (weighted by arrivals over {fit.handling.intervals} intervals).</p>}
      {warnings.length > 0 && (
        <section aria-labelledby="warnings-title" className="flex flex-col gap-2">
          <h2 id="warnings-title" className="text-lg font-semibold">
            Cautions
          </h2>
          {warnings.map((w) => (
            <Banner key={w.code} tone="warn">
              {w.message}
            </Banner>
          ))}
        </section>
      )}
    </div>
  );
}
