/** Worker-thread entry for batch figures: draws one record's figures per message (see batchRender.ts). */
import { parentPort, workerData } from 'node:worker_threads';
import { ConformarkError } from '../../model/errors.js';
import { drawRecordFigures, type DrawSettings, type RecordTask } from './batchRender.js';

const settings = workerData as DrawSettings;
parentPort?.on('message', (msg: { id: number; task: RecordTask }) => {
  drawRecordFigures(msg.task, settings).then(
    (result) => parentPort!.postMessage({ id: msg.id, result }),
    (err: unknown) =>
      parentPort!.postMessage(
        err instanceof ConformarkError ? { id: msg.id, issues: err.issues.map((i) => ({ ...i })) } : { id: msg.id, error: err instanceof Error ? err.message : String(err) },
      ),
  );
});
