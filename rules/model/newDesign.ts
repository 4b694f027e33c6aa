import { FORMAT_ID, FORMAT_VERSION, type Design } from './schema.ts';

/**
 * An empty design with the three rails most mixed-rail boards start from: 5 V, 3.3 V and
 * 1.8 V, each ±5 %. No parts, no nets. A fresh object on every call.
 */
export function newDesign(title = 'Untitled design'): Design {
  return {
    format: FORMAT_ID,
    version: FORMAT_VERSION,
    title,
    rails: [
      { id: '5v0', label: '5 V', nominal: 5, tolerance: 0.05, colour: '#c0562b' },
      { id: '3v3', label: '3.3 V', nominal: 3.3, tolerance: 0.05, colour: '#2f8f6b' },
      { id: '1v8', label: '1.8 V', nominal: 1.8, tolerance: 0.05, colour: '#6a5acd' },
    ],
    parts: [],
    nets: [],
  };
}
