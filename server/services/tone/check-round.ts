import { Op } from 'sequelize';
import type { CheckRoundQuery } from '../../../shared/schemas/tone';
import type { CheckRoundPlace, CheckRoundResponse } from '../../../shared/types/tone';
import { Location, Print, ToneCheck } from '../../models';
import { locationPaths } from '../locations/location-paths';

/**
 * The prints whose next check falls due by the end of the period (overdue ones included),
 * grouped by place in shelf order (the place's full path, then accession number), each with
 * the patches of its last check so the entry form can be prefilled.
 */
export async function checkRound(query: CheckRoundQuery): Promise<CheckRoundResponse> {
  const prints = await Print.findAll({
    where: { nextCheckDue: { [Op.lte]: query.to } },
    attributes: ['id', 'accessionNumber', 'title', 'toneStatus', 'nextCheckDue', 'locationId'],
    order: [['accessionNumber', 'ASC']],
  });
  const locations = await Location.findAll({ attributes: ['id', 'code', 'name', 'parentId'] });
  const paths = locationPaths(locations);
  const lastPatches = await latestPatches(prints.map((p) => p.id));
  const places = new Map<string, CheckRoundPlace>();
  for (const print of prints) {
    const location = locations.find((l) => l.id === print.locationId);
    const key = location ? String(location.id) : 'none';
    const place = places.get(key) ?? {
      location: location
        ? { id: location.id, code: location.code, path: paths.get(location.id) ?? location.name }
        : null,
      prints: [],
    };
    place.prints.push({
      id: print.id,
      accessionNumber: print.accessionNumber,
      title: print.title,
      status: print.toneStatus,
      nextCheckDue: print.nextCheckDue,
      lastPatches: lastPatches.get(print.id) ?? [],
    });
    places.set(key, place);
  }
  const ordered = [...places.values()].sort((x, y) => {
    if (!x.location) return 1;
    if (!y.location) return -1;
    return x.location.path.localeCompare(y.location.path, 'en', { numeric: true });
  });
  return { from: query.from, to: query.to, total: prints.length, places: ordered };
}

async function latestPatches(printIds: number[]): Promise<Map<number, string[]>> {
  const checks = await ToneCheck.findAll({
    where: { printId: printIds },
    attributes: ['printId', 'checkedOn', 'id', 'readings'],
    order: [
      ['checkedOn', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  const map = new Map<number, string[]>();
  for (const check of checks)
    map.set(
      check.printId,
      check.readings.map((r) => r.patch),
    );
  return map;
}
