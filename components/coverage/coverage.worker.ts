/// <reference lib="webworker" />
// The light-map engine off the main thread: the same pure service the report and tests use. The page
// may first send ports to helper workers; full recomputes are then shared with them (sharing.ts).
import {
  type CoverageRequest,
  type CoverageResponse,
  createCoverageService,
  createSharedCoverageService,
  shareHelperOverPort,
} from '@/lib/analysis';

type Incoming = { helpers: MessagePort[] } | { sequence: number; request: CoverageRequest };

let handle: (request: CoverageRequest) => CoverageResponse | Promise<CoverageResponse> =
  createCoverageService().handle;

self.onmessage = async (event: MessageEvent<Incoming>) => {
  const data = event.data;
  if ('helpers' in data) {
    handle = createSharedCoverageService(data.helpers.map(shareHelperOverPort)).handle;
    return;
  }
  try {
    const response = await handle(data.request);
    (self as unknown as Worker).postMessage({ sequence: data.sequence, response }, [response.values.buffer]);
  } catch (error) {
    (self as unknown as Worker).postMessage({ sequence: data.sequence, error: (error as Error).message });
  }
};
