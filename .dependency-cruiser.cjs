/** Layering (DEVELOPERS.md, "Layers"): each layer imports only the layers above it in this list; no cycles. */
const layers = ['model', 'geometry', 'io', 'perceive', 'analysis', 'layout', 'render', 'api'];
const allowed = {
  model: [],
  geometry: ['model'],
  io: ['model', 'geometry'],
  perceive: ['model', 'geometry'],
  analysis: ['model', 'geometry', 'perceive'],
  layout: ['model', 'geometry', 'analysis', 'perceive'],
  render: ['model', 'layout'],
  api: ['model', 'geometry', 'io', 'perceive', 'analysis', 'layout', 'render'],
};
const forbidden = layers.map((layer) => ({
  name: `${layer}-imports-only-upper-layers`,
  severity: 'error',
  from: { path: `^src/${layer}/` },
  to: {
    path: '^src/',
    pathNot: [`^src/(${[layer, ...allowed[layer]].join('|')})/`],
  },
}));
forbidden.push(
  {
    name: 'cli-uses-only-the-public-barrel',
    severity: 'error',
    from: { path: '^src/cli/' },
    to: { path: '^src/', pathNot: ['^src/cli/', '^src/index\\.ts$'] },
  },
  { name: 'no-cycles', severity: 'error', from: {}, to: { circular: true } },
);
/**
 * Rooms inside a layer (DEVELOPERS.md, "Where each job lives"): shared rooms never import a job's room, and a
 * job's room imports another job's room only where listed. Paths are relative to the layer.
 */
const rooms = {
  layout: {
    shared: ['scene\\.ts', 'text/'],
    jobs: { newman: [], ring: [], plots: [], sheets: [] },
  },
  api: {
    shared: ['[^/]+\\.ts', 'figures/', 'tables/', 'inspect/'],
    jobs: { build: [], trajectory: [], batch: [], ensemble: [], explore: ['ensemble'], demo: ['batch', 'build', 'ensemble', 'explore', 'trajectory'] },
  },
};
for (const [layer, { shared, jobs }] of Object.entries(rooms)) {
  const jobNames = Object.keys(jobs);
  forbidden.push({
    name: `${layer}-shared-rooms-import-no-job-room`,
    severity: 'error',
    from: { path: `^src/${layer}/(${shared.join('|')})` },
    to: { path: `^src/${layer}/(${jobNames.join('|')})/` },
  });
  for (const [job, may] of Object.entries(jobs)) {
    const others = jobNames.filter((j) => j !== job && !may.includes(j));
    if (others.length === 0) continue;
    forbidden.push({
      name: `${layer}-${job}-imports-only-its-listed-rooms`,
      severity: 'error',
      from: { path: `^src/${layer}/${job}/` },
      to: { path: `^src/${layer}/(${others.join('|')})/` },
    });
  }
}
module.exports = {
  forbidden,
  options: {
    doNotFollow: { path: 'node_modules' },
    tsConfig: { fileName: 'tsconfig.json' },
    tsPreCompilationDeps: true,
  },
};
