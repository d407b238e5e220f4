/** The data an explorer page carries, read back as its script reads it (packed records unpacked). */
import { gunzipSync } from 'node:zlib';
import type { ExploreModel } from '../../src/index.js';

export function explorePageData(html: string): ExploreModel & { rows: (ExploreModel['rows'][number] & { detail: string | null })[] } {
  const m = /<script type="application\/json" id="explore-data">([\s\S]*?)<\/script>/.exec(html);
  if (!m) throw new Error('no explore-data element');
  const data = JSON.parse(m[1]!) as Omit<ExploreModel, 'rows'> & { rows: { detail: string | null }[] };
  const rows = data.rows.map((r) => {
    const detail = r.detail === null ? { bonds: [], rings: [] } : (JSON.parse(gunzipSync(Buffer.from(r.detail, 'base64')).toString('utf8')) as object);
    return { ...r, ...detail };
  });
  return { ...data, rows } as ReturnType<typeof explorePageData>;
}
