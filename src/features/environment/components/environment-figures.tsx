import type { PlaceEnvironment } from '@shared/types/environment';

const fixed = (value: number | null, digits: number, unit = '') =>
  value === null ? '—' : `${value.toFixed(digits)}${unit}`;

/**
 * The period's figures under our own plain names: "ageing speed" is the relative rate of
 * chemical decay against 20 °C and 50 % RH (isoperm approach, Sebera 1994), "expected
 * life" what that speed implies for a print that would last the stated years at 20 °C / 50 %.
 */
export function EnvironmentFigures({ environment }: { environment: PlaceEnvironment }) {
  const { figures, band, lifeAtReferenceYears } = environment;
  const rows: Array<[string, string, string?]> = [
    [
      'Ageing speed',
      figures.relativeRate === null ? '—' : `${figures.relativeRate.toFixed(2)} ×`,
      'The pace of chemical decay against 20 °C and 50 % RH (1 ×); the same harm as this constant pace over the period.',
    ],
    [
      'Expected life',
      figures.expectedLifeYears === null
        ? '—'
        : `about ${Math.round(figures.expectedLifeYears)} years`,
      `For a print that would last ${lifeAtReferenceYears} years at 20 °C and 50 % RH.`,
    ],
    ['Mean temperature', fixed(figures.meanTemperatureC, 1, ' °C')],
    ['Mean humidity', fixed(figures.meanRh, 0, ' % RH')],
    ['Dew point of the mean air', fixed(figures.dewPointC, 1, ' °C')],
    ['Largest daily humidity swing', fixed(figures.dailyRhSwingMax, 0, ' points')],
    ['Typical daily humidity swing', fixed(figures.dailyRhSwingMean, 1, ' points')],
    [
      'Days outside the band',
      `${figures.daysOutside.tooWarm} too warm · ${figures.daysOutside.tooDamp} too damp · ${figures.daysOutside.tooDry} too dry · ${figures.daysOutside.swing} swung more than ${band.maxDailyRhSwing} points`,
    ],
  ];
  return (
    <dl className="grid max-w-3xl grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]">
      {rows.map(([label, value, note]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-ink-soft">{label}</dt>
          <dd className="tabular-nums">
            {value}
            {note && <span className="block text-xs text-ink-faint">{note}</span>}
          </dd>
        </div>
      ))}
    </dl>
  );
}
