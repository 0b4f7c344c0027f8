/// <reference lib="webworker" />
// A helper for the light-map worker: computes its share of the grid's rows when every unit is computed
// again (lib/analysis/coverage/sharing.ts). Its message port arrives in the first message.
import { serveSharesOnPort } from '@/lib/analysis';

self.onmessage = (event: MessageEvent<{ port: MessagePort }>) => {
  serveSharesOnPort(event.data.port);
};
