/** Messages between the page and the checking worker. */
import type { ReadReply, ReportReply, Stage, StoreLarge } from './jobs.ts';

export type Request =
  | { readonly id: number; readonly kind: 'read'; readonly file: Blob; readonly store?: StoreLarge }
  /** `key`: the id of an earlier read whose design to report on; else `doc`, a stored document. */
  | { readonly id: number; readonly kind: 'report'; readonly key?: number; readonly doc?: unknown };

export type Response =
  | { readonly id: number; readonly kind: 'progress'; readonly stage: Stage }
  | { readonly id: number; readonly kind: 'read'; readonly reply: ReadReply }
  | { readonly id: number; readonly kind: 'report'; readonly reply: ReportReply }
  | { readonly id: number; readonly kind: 'failed'; readonly error: string };
