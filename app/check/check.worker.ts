/**
 * The checking worker: reads, checks and reports large designs off the page's main thread, so
 * that the page keeps answering input. It keeps the last design it read and its result, so that
 * "report only" right after an import does not check it twice.
 */
import type { CheckResult } from '../../rules/engine/index.ts';
import type { Design } from '../../rules/model/index.ts';
import { readJob, reportJob, storeIfLarge, type Stage } from './jobs.ts';
import type { Request, Response } from './protocol.ts';

let last: { key: number; design: Design; result: CheckResult } | null = null;
const post = (message: Response) => postMessage(message);

addEventListener('message', (event: MessageEvent<Request>) => void answer(event.data));

async function answer(request: Request): Promise<void> {
  const progress = (stage: Stage) => post({ id: request.id, kind: 'progress', stage });
  try {
    if (request.kind === 'read') {
      progress('reading');
      const read = readJob(await request.file.text(), progress);
      last =
        read.reply.ok && read.result !== null && read.reply.design !== null
          ? { key: request.id, design: read.reply.design, result: read.result }
          : null;
      const { reply } = await storeIfLarge(read, request.store, progress);
      post({ id: request.id, kind: 'read', reply });
    } else {
      const cached = request.key !== undefined && last?.key === request.key ? last : null;
      const reply = reportJob(cached !== null ? cached : { doc: request.doc }, progress);
      post({ id: request.id, kind: 'report', reply });
    }
  } catch (error) {
    post({ id: request.id, kind: 'failed', error: error instanceof Error ? error.message : String(error) });
  }
}
