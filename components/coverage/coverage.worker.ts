/// <reference lib="webworker" />
// The light-map engine off the main thread: the same pure service the report and tests use.
import { type CoverageRequest, createCoverageService } from '@/lib/analysis';

const service = createCoverageService();

self.onmessage = (event: MessageEvent<{ sequence: number; request: CoverageRequest }>) => {
  try {
    const response = service.handle(event.data.request);
    (self as unknown as Worker).postMessage({ sequence: event.data.sequence, response }, [response.values.buffer]);
  } catch (error) {
    (self as unknown as Worker).postMessage({ sequence: event.data.sequence, error: (error as Error).message });
  }
};
