/**
 * Drawing a batch's figures, in this thread or on worker threads. Both paths run the same function on the
 * same data (`drawRecordFigures`), and results are put back in job order, so the output is byte-identical
 * with and without workers.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { Molecule } from '../../model/molecule.js';
import { ConformarkError, type Issue } from '../../model/errors.js';
import type { Theme } from '../../render/theme.js';
import { figureBytes, type FigureFormat } from '../figures/writeFigure.js';
import { drawFigure, type FigureKind } from '../figures/figureKinds.js';
import { prepareRecord } from '../prepare.js';

/** One figure to draw for a record. */
export interface FigureJob {
  readonly kind: FigureKind;
  readonly bond?: readonly [number, number];
  /** Index into the record's rings (0-based, `findRings` order). */
  readonly ring?: number;
  readonly idPrefix: string;
}

/** A record and its figures: what a worker receives. */
export interface RecordTask {
  readonly molecule: Molecule;
  readonly jobs: readonly FigureJob[];
}

/** A drawn figure: the SVG, its size (theme units) and the bytes of every other requested format. */
export interface DrawnJob {
  readonly svg: string;
  readonly width: number;
  readonly height: number;
  readonly files: readonly { readonly format: FigureFormat; readonly data: string | Uint8Array }[];
}

/** Settings shared by every task. */
export interface DrawSettings {
  readonly theme: Theme;
  readonly formats: readonly FigureFormat[];
  /** PNG resolution, dots per inch. Default 300. */
  readonly dpi?: number;
  /** Most pixels of a PNG. Default 64,000,000. */
  readonly maxPixels?: number;
}

/** Draws every figure of one record (the unit of work on a worker). */
export async function drawRecordFigures(task: RecordTask, settings: DrawSettings): Promise<DrawnJob[]> {
  const prepared = prepareRecord(task.molecule);
  const out: DrawnJob[] = [];
  for (const job of task.jobs) {
    const fig = drawFigure(job.kind, { ...prepared, theme: settings.theme, idPrefix: job.idPrefix }, job);
    const files = [];
    for (const format of settings.formats) files.push({ format, data: await figureBytes(fig.svg, format, { dpi: settings.dpi, maxPixels: settings.maxPixels }) });
    out.push({ svg: fig.svg, width: fig.width, height: fig.height, files });
  }
  return out;
}

const WORKER = new URL('./batchWorker.js', import.meta.url);

/** True when the compiled worker script is there (not when running from TypeScript sources). */
export function workersAvailable(): boolean {
  return existsSync(fileURLToPath(WORKER));
}

/**
 * Draws every task, on `threads` workers when `threads > 1` and the worker script exists, else in this thread.
 * `onDone` is called with the number of figures finished after each task.
 */
export async function drawTasks(
  tasks: readonly RecordTask[],
  settings: DrawSettings,
  threads: number,
  onDone: (figures: number) => void = () => {},
): Promise<DrawnJob[][]> {
  if (threads <= 1 || tasks.length < 2 || !workersAvailable()) {
    const out: DrawnJob[][] = [];
    for (const task of tasks) {
      out.push(await drawRecordFigures(task, settings));
      onDone(task.jobs.length);
    }
    return out;
  }
  return drawOnWorkers(tasks, settings, Math.min(threads, tasks.length), onDone);
}

async function drawOnWorkers(
  tasks: readonly RecordTask[],
  settings: DrawSettings,
  threads: number,
  onDone: (figures: number) => void,
): Promise<DrawnJob[][]> {
  const results: DrawnJob[][] = new Array(tasks.length);
  let next = 0;
  const workers = Array.from({ length: threads }, () => new Worker(WORKER, { workerData: settings }));
  try {
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const send = () => {
              if (next >= tasks.length) return resolve();
              const id = next++;
              worker.postMessage({ id, task: tasks[id] });
            };
            worker.on('message', (msg: { id: number; result?: DrawnJob[]; error?: string; issues?: Issue[] }) => {
              // a user error on a worker (a PNG over the pixel cap) stays a user error here
              if (msg.issues !== undefined) return reject(new ConformarkError(msg.issues));
              if (msg.error !== undefined) return reject(new Error(msg.error));
              results[msg.id] = msg.result!;
              onDone(tasks[msg.id]!.jobs.length);
              send();
            });
            worker.on('error', reject);
            worker.on('exit', (code) => {
              if (code !== 0) reject(new Error(`figure worker stopped with exit code ${code}`));
            });
            send();
          }),
      ),
    );
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results;
}
