/**
 * The canvas's routing worker: routing a large design takes longer than a frame, so it runs
 * here, off the thread that paints; the worker keeps its router between jobs, so that a moved
 * chip re-routes only its neighbourhood.
 */
import { WireRouter } from '../../rules/routing/index.ts';
import { solve, type HopMemory, type RouteJob } from './routeJob.ts';

const router = new WireRouter();
const memory: HopMemory = new Map();

self.onmessage = (e: MessageEvent<RouteJob>) => {
  self.postMessage(solve(router, e.data, memory));
};
