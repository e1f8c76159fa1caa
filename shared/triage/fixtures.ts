import type { Level, TriageInput } from './engine';

/** A deterministic pseudo-random round of a big event, for benchmarks (mulberry32). */
export function largeRound(opts: {
  items: number;
  volunteers: number;
  benches: number;
  seatedShare: number;
  seed?: number;
}): TriageInput {
  let s = opts.seed ?? 1;
  const rnd = () => {
    s = (s + 0x6d2b79f5) | 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(rnd() * xs.length)];
  const skills = [
    'electrical',
    'electronics',
    'computers',
    'phones',
    'textiles',
    'bikes',
    'woodwork',
    'toys',
    'jewellery',
    'mechanical',
  ];
  const kit = [
    'soldering-station',
    'multimeter',
    'appliance-safety-tester',
    'isolation-transformer',
    'sewing-machine',
    'bike-stand',
    'hot-air-station',
    'clamps',
  ];
  const benches = Array.from({ length: opts.benches }, (_, i) => ({
    id: `b${i}`,
    seats: 1 + Math.floor(rnd() * 4),
    equipment: kit.filter(() => rnd() < 0.45),
  }));
  const volunteers = Array.from({ length: opts.volunteers }, (_, i) => {
    const own: Record<string, Level> = {};
    for (const sk of skills) if (rnd() < 0.3) own[sk] = (1 + Math.floor(rnd() * 3)) as Level;
    return {
      id: `v${i}`,
      skills: own,
      capacity: 1 + Math.floor(rnd() * 2),
      ...(rnd() < opts.seatedShare ? { benchId: pick(benches).id } : {}),
    };
  });
  const items = Array.from({ length: opts.items }, (_, i) => ({
    id: `i${i}`,
    skill: pick(skills),
    minLevel: (1 + Math.floor(rnd() * 3)) as Level,
    equipment: kit.filter(() => rnd() < 0.12),
    priority: 1 + Math.floor(rnd() * 12),
  }));
  return { items, volunteers, benches };
}
