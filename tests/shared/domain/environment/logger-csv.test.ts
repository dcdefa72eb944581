import { describe, expect, it } from 'vitest';
import { parseLoggerCsv } from '../../../../shared/domain/environment/logger-csv';

const FILE = [
  'Serial Number: LG-1043',
  'Exported by the logger software',
  'Date-Time,Temperature (°C),Humidity (%RH)',
  '2026-03-01 00:00:00,18.5,45.2',
  '2026-03-01 00:10:00,18.4,45.6',
  '2026-03-01 00:10:00,18.4,45.6',
  '2026-03-01 00:20:00,18.3,145',
  '2026-03-01 00:30:00,bad,45',
  '2026-03-01 00:40:00,18.2,46.0',
  '2026-03-01 00:50:00,18.2,46.0',
  '2026-03-01 01:00:00,18.1,46.0',
  '2026-03-01 03:00:00,18.0,46.1',
  '2026-03-01 03:10:00,17.9,46.2',
].join('\n');

describe('logger CSV', () => {
  it('finds the header after a preamble, the logger id, and the columns by their names', () => {
    const log = parseLoggerCsv(FILE, { mapping: null, timeZone: 'UTC' });
    expect(log.loggerId).toBe('LG-1043');
    expect(log.mapping).toMatchObject({
      timestamp: 'Date-Time',
      temperature: 'Temperature (°C)',
      humidity: 'Humidity (%RH)',
    });
    expect(log.readings.map((r) => r.temperatureC)).toEqual([
      18.5, 18.4, 18.2, 18.2, 18.1, 18.0, 17.9,
    ]);
  });

  it('drops repeated times, refuses implausible values, and reports the pause', () => {
    const log = parseLoggerCsv(FILE, { mapping: null, timeZone: 'UTC' });
    expect(log.duplicates).toBe(1);
    expect(log.rejectedCount).toBe(2);
    expect(log.rejected.map((r) => r.row)).toEqual([7, 8]);
    expect(log.intervalMinutes).toBe(10);
    expect(log.gapCount).toBe(1);
    expect(log.gaps[0]).toMatchObject({ minutes: 120, from: '2026-03-01T01:00:00.000Z' });
  });

  it('reads local times in the logger’s zone: 01:00 in Berlin in winter is 00:00 UTC', () => {
    const log = parseLoggerCsv('time,t,rh\n2026-01-15 01:00,20,50\n2026-07-15 02:00,20,50', {
      mapping: { timestamp: 'time', temperature: 't', humidity: 'rh' },
      timeZone: 'Europe/Berlin',
    });
    // CET is UTC+1 and CEST UTC+2 (IANA tz database).
    expect(new Date(log.readings[0]!.at).toISOString()).toBe('2026-01-15T00:00:00.000Z');
    expect(new Date(log.readings[1]!.at).toISOString()).toBe('2026-07-15T00:00:00.000Z');
  });

  it('gives each reading its local day, not the UTC one', () => {
    const log = parseLoggerCsv('time,t,rh\n2026-01-15 23:30,20,50', {
      mapping: { timestamp: 'time', temperature: 't', humidity: 'rh' },
      timeZone: 'America/New_York',
    });
    expect(new Date(log.readings[0]!.at).toISOString()).toBe('2026-01-16T04:30:00.000Z');
    expect(log.readings[0]!.day).toBe('2026-01-15');
  });

  it('reads day-first dates, semicolons with decimal commas, and Fahrenheit', () => {
    const log = parseLoggerCsv('Zeit;Temp °F;RH\n01.03.2026 08:00;68,0;50,5', {
      mapping: { timestamp: 'Zeit', temperature: 'Temp °F', humidity: 'RH', dateOrder: 'dmy' },
      timeZone: 'UTC',
    });
    expect(log.mapping.temperatureUnit).toBe('F');
    expect(log.readings[0]).toMatchObject({ day: '2026-03-01', rh: 50.5 });
    expect(log.readings[0]!.temperatureC).toBeCloseTo(20, 10);
  });

  it('refuses a file without the named columns', () => {
    expect(() =>
      parseLoggerCsv('a,b,c\n1,2,3', {
        mapping: { timestamp: 'time', temperature: 't', humidity: 'rh' },
        timeZone: 'UTC',
      }),
    ).toThrow(/No header line/);
  });
});
