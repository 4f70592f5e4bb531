// Lays out a large tree graph off the main thread, so the editor keeps taking keystrokes while
// dagre works (about 100 ms for 300 steps). Receives the structure, answers with the positions.
import { computeLayout } from './graph-layout';

interface LayoutRequest {
  key: string;
  ids: string[];
  edges: { id: string; from: string; to: string }[];
  start: string;
}

self.addEventListener('message', (event: MessageEvent<LayoutRequest>) => {
  const { key, ids, edges, start } = event.data;
  const positions = [...computeLayout(ids, edges, start)];
  self.postMessage({ key, positions });
});
