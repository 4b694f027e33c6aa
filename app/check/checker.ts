/**
 * The page's side of the checking worker: one request at a time per call, answered by a
 * promise, with its stages reported as they start. Where there is no Worker (tests under
 * Node) the same jobs run inline.
 */
import type { CheckResult } from '../../rules/engine/index.ts';
import type { Design } from '../../rules/model/index.ts';
import {
  readJob,
  reportJob,
  storeIfLarge,
  type ReadReply,
  type ReportReply,
  type Stage,
  type StoreLarge,
} from './jobs.ts';
import type { Request, Response } from './protocol.ts';

export type OnStage = (stage: Stage) => void;

/** A read's reply and the key a later report may name to reuse its check. */
export interface ReadOutcome {
  readonly reply: ReadReply;
  readonly key: number;
}

export interface Checker {
  /** Read and check a design file; with `store`, a design above its limit is stored where it is read. */
  read(file: Blob, onStage: OnStage, store?: StoreLarge): Promise<ReadOutcome>;
  /** The report of an earlier read (`key`) or of a stored document. */
  report(source: { readonly key: number } | { readonly doc: unknown }, onStage: OnStage): Promise<ReportReply>;
}

type Unnumbered = Request extends infer R ? (R extends Request ? Omit<R, 'id'> : never) : never;

type Pending = { resolve: (r: Response) => void; onStage: OnStage };

class WorkerChecker implements Checker {
  private worker: Worker | null = null;
  private next = 1;
  private readonly pending = new Map<number, Pending>();

  private send(request: Unnumbered, onStage: OnStage): Promise<Response> {
    const worker = (this.worker ??= this.start());
    const id = this.next++;
    return new Promise<Response>((resolve) => {
      this.pending.set(id, { resolve, onStage });
      worker.postMessage({ ...request, id } as Request);
    });
  }

  private start(): Worker {
    const worker = new Worker(new URL('./check.worker.ts', import.meta.url), {
      type: 'module',
      name: 'railcross-check',
    });
    worker.addEventListener('message', (event: MessageEvent<Response>) => {
      const r = event.data;
      const p = this.pending.get(r.id);
      if (p === undefined) return;
      if (r.kind === 'progress') return p.onStage(r.stage);
      this.pending.delete(r.id);
      p.resolve(r);
    });
    worker.addEventListener('error', (event) => {
      // A worker that fails to start or crashes answers every open request with the reason.
      for (const [id, p] of this.pending)
        p.resolve({ id, kind: 'failed', error: event.message || 'the checking worker stopped' });
      this.pending.clear();
      this.worker = null;
    });
    return worker;
  }

  async read(file: Blob, onStage: OnStage, store?: StoreLarge): Promise<ReadOutcome> {
    // The file itself crosses (a reference): its text is decoded in the worker, not here.
    const r = await this.send(store === undefined ? { kind: 'read', file } : { kind: 'read', file, store }, onStage);
    if (r.kind === 'failed') throw new Error(r.error);
    if (r.kind !== 'read') throw new Error(`the checking worker answered ${r.kind} to a read`);
    return { reply: r.reply, key: r.id };
  }

  async report(source: { readonly key: number } | { readonly doc: unknown }, onStage: OnStage): Promise<ReportReply> {
    const r = await this.send({ kind: 'report', ...source }, onStage);
    if (r.kind === 'failed') return { ok: false, errors: [r.error] };
    if (r.kind !== 'report') return { ok: false, errors: [`the checking worker answered ${r.kind} to a report`] };
    return r.reply;
  }
}

/** The same jobs on this thread: for tests, and browsers without module workers. */
export class InlineChecker implements Checker {
  private last: { key: number; design: Design; result: CheckResult } | null = null;
  private next = 1;

  async read(file: Blob, onStage: OnStage, store?: StoreLarge): Promise<ReadOutcome> {
    const key = this.next++;
    const read = readJob(await file.text(), onStage);
    this.last =
      read.reply.ok && read.result !== null && read.reply.design !== null
        ? { key, design: read.reply.design, result: read.result }
        : null;
    const { reply } = await storeIfLarge(read, store, onStage);
    return { reply, key };
  }

  async report(source: { readonly key: number } | { readonly doc: unknown }, onStage: OnStage): Promise<ReportReply> {
    const cached = 'key' in source && this.last?.key === source.key ? this.last : null;
    if (cached !== null) return reportJob(cached, onStage);
    return reportJob({ doc: 'doc' in source ? source.doc : undefined }, onStage);
  }
}

export function makeChecker(): Checker {
  return typeof Worker === 'function' ? new WorkerChecker() : new InlineChecker();
}
