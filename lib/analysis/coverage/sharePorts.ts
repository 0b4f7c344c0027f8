/**
 * Helpers for sharing.ts reached through message ports: a MessagePort of a browser's
 * MessageChannel (to a Web Worker) or of Node's (to a worker thread) — both deliver `message` events
 * with the data in `event.data`. Answers hand their arrays over instead of copying them.
 */
import { type ShareHelper, type ShareRequest, type ShareResult, createShareComputer } from './sharing';

/** What both a browser's and Node's MessagePort offer. */
export interface SharePort {
  postMessage(message: unknown, transfer?: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: { data: unknown }) => void): void;
  start?(): void;
}

type ShareAnswer =
  { readonly id: number; readonly result: ShareResult } | { readonly id: number; readonly error: string };

/** A helper that sends each request over `port` and resolves with the answer of the same number. */
export function shareHelperOverPort(port: SharePort): ShareHelper {
  let nextId = 0;
  const waiting = new Map<
    number,
    { resolve: (result: ShareResult) => void; reject: (error: Error) => void }
  >();
  port.addEventListener('message', (event) => {
    const answer = event.data as ShareAnswer;
    const entry = waiting.get(answer.id);
    if (!entry) return;
    waiting.delete(answer.id);
    if ('result' in answer) entry.resolve(answer.result);
    else entry.reject(new Error(answer.error));
  });
  port.start?.();
  return (request) =>
    new Promise<ShareResult>((resolve, reject) => {
      nextId += 1;
      waiting.set(nextId, { resolve, reject });
      port.postMessage({ id: nextId, request });
    });
}

/** Answer share requests arriving on `port` (run this in the helper's worker). */
export function serveSharesOnPort(port: SharePort): void {
  const compute = createShareComputer();
  port.addEventListener('message', (event) => {
    const { id, request } = event.data as { id: number; request: ShareRequest };
    let answer: ShareAnswer;
    try {
      answer = { id, result: compute(request) };
    } catch (error) {
      port.postMessage({ id, error: `light map helper: ${(error as Error).message}` });
      return;
    }
    port.postMessage(answer, [answer.result.values.buffer, answer.result.overlaps.buffer]);
  });
  port.start?.();
}
