/** A logger export as a store-room logger writes it: a preamble naming its serial, then rows. */
export function buildLoggerCsv(options: {
  serial?: string;
  /** Local wall-clock start, `YYYY-MM-DD`. */
  start: string;
  days: number;
  intervalMinutes?: number;
  header?: [string, string, string];
  climate: (index: number, hourOfDay: number) => [number, number];
}): string {
  const interval = options.intervalMinutes ?? 60;
  const header = options.header ?? ['Date-Time', 'Temperature (°C)', 'Humidity (%RH)'];
  const lines: string[] = [];
  if (options.serial) lines.push(`Serial Number: ${options.serial}`, 'Logger export');
  lines.push(header.join(','));
  const start = Date.parse(`${options.start}T00:00:00Z`);
  const count = (options.days * 24 * 60) / interval;
  for (let i = 0; i < count; i += 1) {
    const wall = new Date(start + i * interval * 60_000).toISOString();
    const [t, rh] = options.climate(i, Number(wall.slice(11, 13)));
    lines.push(`${wall.slice(0, 10)} ${wall.slice(11, 19)},${t.toFixed(2)},${rh.toFixed(1)}`);
  }
  return `${lines.join('\n')}\n`;
}
