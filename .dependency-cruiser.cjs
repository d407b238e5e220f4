/** Layering (STYLE.md): each layer imports only the layers above it in this list; no cycles. */
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
module.exports = {
  forbidden,
  options: {
    doNotFollow: { path: 'node_modules' },
    tsConfig: { fileName: 'tsconfig.json' },
    tsPreCompilationDeps: true,
  },
};
