// Preload (`node --import ./test/helpers/recordModules.mjs ...`): at exit, writes every module file the
// process loaded (ES modules through a resolve hook, CommonJS through require's cache, native addons
// through process.dlopen), one absolute path a line, to the file named by CONFORMARK_MODULE_LIST.
import { appendFileSync, writeFileSync } from 'node:fs';
import { createRequire, register } from 'node:module';
import { MessageChannel } from 'node:worker_threads';

const list = process.env.CONFORMARK_MODULE_LIST;
if (list) {
  const esm = new Set();
  const { port1, port2 } = new MessageChannel();
  port1.on('message', (url) => esm.add(url));
  port1.unref();
  register('./recordModulesHooks.mjs', { parentURL: import.meta.url, data: { port: port2 }, transferList: [port2] });
  const addons = [];
  const dlopen = process.dlopen;
  process.dlopen = function (module, filename, ...rest) {
    addons.push(filename);
    return dlopen.call(this, module, filename, ...rest);
  };
  const require = createRequire(import.meta.url);
  process.on('exit', () => {
    const files = new Set([...esm].filter((u) => u.startsWith('file:')).map((u) => decodeURIComponent(new URL(u).pathname)));
    for (const f of Object.keys(require.cache)) files.add(f);
    for (const f of addons) files.add(f);
    writeFileSync(list, '');
    appendFileSync(list, [...files].sort().join('\n') + '\n');
  });
}
