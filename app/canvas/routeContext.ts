/** The canvas's route store (routes.ts), handed to the wires. */
import { createContext } from 'react';
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { RouteState } from './routes.ts';

export const RouteContext = createContext<StoreApi<RouteState>>(
  createStore<RouteState>(() => ({ routes: new Map(), hops: new Map(), junctions: new Map() })),
);
