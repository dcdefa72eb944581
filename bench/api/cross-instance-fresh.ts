import { buildPrint } from '../../tests/support/factories';
import { percentile } from '../load';

const GIVE_UP_MS = 10_000;

/** A word no other print holds, from a number: letters only, so the index keeps it whole. */
const tokenOf = (n: number) =>
  `xfresh${n
    .toString(26)
    .split('')
    .map((digit) => String.fromCharCode(97 + parseInt(digit, 26)))
    .join('')}`;

/**
 * Issue 16's freshness across instances: creates `creates` prints one after another through
 * instance A and, after each 201, searches for its title word through instance B again and
 * again until it is found. Milliseconds from A's answer to B's first hit; a print not found
 * within 10 s counts as 10 s and as `notFound`.
 */
export async function crossInstanceFreshness(
  a: string,
  b: string,
  headers: Record<string, string>,
  creates: number,
) {
  const delays: number[] = [];
  let notFound = 0;
  let polls = 0;
  for (let n = 0; n < creates; n += 1) {
    const token = tokenOf(n);
    const created = await fetch(`${a}/api/prints`, {
      method: 'POST',
      headers,
      body: JSON.stringify(buildPrint({ title: `Across ${token}` })),
    });
    await created.arrayBuffer();
    if (created.status !== 201) throw new Error(`create through A answered ${created.status}`);
    const answered = performance.now();
    let found = false;
    while (!found && performance.now() - answered < GIVE_UP_MS) {
      polls += 1;
      const search = await fetch(`${b}/api/prints?q=${token}`, { headers });
      found = ((await search.json()) as { total: number }).total > 0;
    }
    if (!found) notFound += 1;
    delays.push(found ? performance.now() - answered : GIVE_UP_MS);
  }
  delays.sort((x, y) => x - y);
  const round = (ms: number) => Math.round(ms * 10) / 10;
  return {
    creates,
    notFound,
    searchesThroughB: polls,
    p50Ms: round(percentile(delays, 0.5)),
    p99Ms: round(percentile(delays, 0.99)),
    maxMs: round(delays.at(-1) ?? 0),
  };
}
