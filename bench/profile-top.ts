import { readFileSync } from 'node:fs';

/**
 * Where a `--cpu-prof` profile spent its time: self time summed per function and per
 * package/file, largest first. Usage: `npx tsx bench/profile-top.ts FILE.cpuprofile [N]`.
 */
interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

const [file, count = '25'] = process.argv.slice(2);
const profile = JSON.parse(readFileSync(file!, 'utf8')) as Profile;
const byId = new Map(profile.nodes.map((node) => [node.id, node]));
const selfMs = new Map<number, number>();
profile.samples.forEach((id, index) => {
  selfMs.set(id, (selfMs.get(id) ?? 0) + (profile.timeDeltas[index] ?? 0) / 1000);
});
const total = [...selfMs.values()].reduce((a, b) => a + b, 0);

const where = (url: string) => {
  const match = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (match) return match[1]!;
  return url.replace(/^.*\/(server|shared|bench|seeds)\//, '$1/') || '(native)';
};
const sum = (key: (node: ProfileNode) => string) => {
  const totals = new Map<string, number>();
  for (const [id, ms] of selfMs)
    totals.set(key(byId.get(id)!), (totals.get(key(byId.get(id)!)) ?? 0) + ms);
  return [...totals]
    .sort((a, b) => b[1] - a[1])
    .slice(0, Number(count))
    .map(([name, ms]) => ({
      name,
      ms: Math.round(ms),
      share: `${((ms / total) * 100).toFixed(1)} %`,
    }));
};
console.log(`total sampled ${Math.round(total)} ms`);
console.table(sum((node) => where(node.callFrame.url)));
console.table(
  sum(
    (node) =>
      `${node.callFrame.functionName || '(anonymous)'} ${where(node.callFrame.url)}:${node.callFrame.lineNumber}`,
  ),
);
