/**
 * The sweep's Web Worker: a thin shell around runSweepRange(), which is pure and tested in Node. It
 * assesses the points chunk by chunk and posts those assessed so far with the progress (at most every
 * SWEEP_POST_INTERVAL ms) as typed-array columns whose buffers it hands over (explore/sweepColumns.ts);
 * the app cancels a sweep by terminating the worker.
 *
 * It keeps a copy of the points, and when the sweep ends it builds the chart's model for the chart the
 * page said it shows (the last 'plan' message) and draws that chart's points (charts/pointsPicture.ts),
 * so the page takes the model and the pixels over instead of a pass over every point on its main thread.
 */
import { drawPointsPicture } from '../charts/pointsPicture';
import { scratchSurface, spriteLookup, spriteMaker } from '../charts/markerSprites';
import { ChartModelBuilder, scatterInputOf } from '../explore/chartModelBuilder';
import { ProcessCache } from '../explore/partitionFigures';
import { runSweepRange, sweepSize } from '../explore/sweep';
import {
  chunkBuffers,
  encodeSweepChunk,
  SweepTable,
  SweepTextTables,
  type SweepChunk,
} from '../explore/sweepColumns';
import {
  SWEEP_CHUNK,
  SWEEP_POST_INTERVAL,
  type SweepChart,
  type SweepChartPlan,
  type SweepCommand,
  type SweepReport,
} from '../explore/sweepProtocol';

interface WorkerScope {
  postMessage(message: SweepReport, transfer?: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<SweepCommand>) => void): void;
}

const scope = self as unknown as WorkerScope;

/**
 * The worker's marker sprites, drawn as the page draws its own (charts/markerSprites.ts) on an
 * OffscreenCanvas; null where the worker has none (the page then draws the points itself).
 */
const sprites =
  typeof OffscreenCanvas === 'function'
    ? spriteMaker(scratchSurface((side) => new OffscreenCanvas(side, side)))
    : null;

/** The run being swept and the last chart plan the page sent for it. */
let current = -1;
let plan: SweepChartPlan | null = null;

/** The finished sweep's chart model and points picture for `plan`. */
function chartOf(table: SweepTable, plan: SweepChartPlan, make: NonNullable<typeof sprites>): SweepChart {
  const builder = new ChartModelBuilder(table, plan.xAxis, plan.yAxis, plan.limits);
  builder.update();
  const model = builder.snapshot();
  const colours = plan.colours;
  const picture = drawPointsPicture(
    scatterInputOf(model, (series) => colours[series] ?? ''),
    plan,
    spriteLookup(make, plan.ratio),
  );
  return { xAxis: plan.xAxis, yAxis: plan.yAxis, limits: plan.limits, model: builder.state(), picture };
}

function chartBuffers(chart: SweepChart): ArrayBuffer[] {
  const { pixels, x, y } = chart.picture;
  return [...ChartModelBuilder.buffers(chart.model), ...[pixels, x, y].map((a) => a.buffer as ArrayBuffer)];
}

/** Runs `then` once the messages already queued for this worker (the page's plan) have been handled. */
function afterQueuedMessages(then: () => void): void {
  const channel = new MessageChannel();
  channel.port1.onmessage = () => {
    channel.port1.close();
    then();
  };
  channel.port2.postMessage(null);
}

scope.addEventListener('message', (event) => {
  const command = event.data;
  if (command.type === 'plan') {
    if (command.runId === current) plan = command.plan;
    return;
  }
  if (command.type !== 'start') return;
  const { runId, request } = command;
  current = runId;
  plan = null;
  try {
    const started = performance.now();
    const total = sweepSize(request);
    const cache = new ProcessCache();
    const tables = new SweepTextTables();
    const table = new SweepTable();
    table.reserve(total);
    // Each chunk is encoded at once (its point objects die young); the encoded ones wait for the post.
    let pending: SweepChunk[] = [];
    let posted = started;
    for (let start = 0; start < total; start += SWEEP_CHUNK) {
      const chunk = encodeSweepChunk(runSweepRange(request, start, start + SWEEP_CHUNK, cache), tables);
      table.append(chunk);
      pending.push(chunk);
      const done = Math.min(total, start + SWEEP_CHUNK);
      const now = performance.now();
      if (done < total && now - posted < SWEEP_POST_INTERVAL) continue;
      posted = now;
      scope.postMessage(
        { type: 'progress', runId, done, total, chunks: pending },
        pending.flatMap(chunkBuffers),
      );
      pending = [];
    }
    const elapsed = (performance.now() - started) / 1000;
    afterQueuedMessages(() => {
      try {
        const chart = plan && sprites ? chartOf(table, plan, sprites) : undefined;
        const rows = table.state();
        scope.postMessage({ type: 'done', runId, total, elapsed, chart, table: rows }, [
          ...(chart ? chartBuffers(chart) : []),
          ...SweepTable.buffers(rows),
        ]);
      } catch (error) {
        // The chart and the table are a convenience: without them the page appends and draws itself.
        console.error(error);
        scope.postMessage({ type: 'done', runId, total, elapsed });
      }
    });
  } catch (error) {
    scope.postMessage({
      type: 'failed',
      runId,
      error: error instanceof Error ? error.message : String(error),
    });
  }
});
