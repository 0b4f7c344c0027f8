'use client';

import { useEffect, useRef, useState } from 'react';
import { type CoverageRequest, type CoverageResponse, createCoverageService } from '@/lib/analysis';

export type CoverageStatus =
  | { state: 'idle' }
  | { state: 'working' }
  | { state: 'ready'; response: CoverageResponse }
  | { state: 'error'; message: string };

/**
 * Helper workers to start: one per core beyond the first, at most three. While a full recompute runs
 * the page's own thread is mostly idle, so the light-map worker and its helpers have the cores.
 */
function helperCount(): number {
  const cores = typeof navigator === 'undefined' ? 1 : navigator.hardwareConcurrency || 1;
  return Math.min(3, Math.max(0, cores - 1));
}

/**
 * Runs coverage requests in a Web Worker, one at a time: while one is being computed only the newest
 * request waits, so a drag never queues up stale work. Falls back to the main thread where Workers
 * are missing.
 */
export function useCoverage(request: CoverageRequest | string | null): {
  status: CoverageStatus;
  last: CoverageResponse | null;
} {
  const [status, setStatus] = useState<CoverageStatus>({ state: 'idle' });
  const [last, setLast] = useState<CoverageResponse | null>(null);
  const worker = useRef<Worker | null>(null);
  const busy = useRef(false);
  const waiting = useRef<CoverageRequest | null>(null);
  const sequence = useRef(0);
  const sendRequest = useRef<((request: CoverageRequest) => void) | null>(null);

  useEffect(() => {
    if (typeof Worker === 'undefined') return;
    const instance = new Worker(new URL('./coverage.worker.ts', import.meta.url));
    worker.current = instance;
    // Helpers for full recomputes, one per further core (at most three), each joined to the worker by a
    // channel of its own; started with the first request, so an editor that never shows the map has none.
    const helpers: Worker[] = [];
    let helpersStarted = false;
    const startHelpers = () => {
      helpersStarted = true;
      for (let index = 0; index < helperCount(); index += 1)
        helpers.push(new Worker(new URL('./coverageShare.worker.ts', import.meta.url)));
      if (helpers.length === 0) return;
      const ports = helpers.map((helper) => {
        const channel = new MessageChannel();
        helper.postMessage({ port: channel.port2 }, [channel.port2]);
        return channel.port1;
      });
      instance.postMessage({ helpers: ports }, ports);
    };
    instance.onmessage = (
      event: MessageEvent<{ sequence: number; response?: CoverageResponse; error?: string }>,
    ) => {
      busy.current = false;
      if (event.data.response) {
        setLast(event.data.response);
        setStatus({ state: 'ready', response: event.data.response });
      } else
        setStatus({ state: 'error', message: event.data.error ?? 'The light map could not be computed.' });
      const next = waiting.current;
      waiting.current = null;
      if (next) send(next);
    };
    const send = (next: CoverageRequest) => {
      if (!helpersStarted) startHelpers();
      busy.current = true;
      sequence.current += 1;
      instance.postMessage({ sequence: sequence.current, request: next });
    };
    sendRequest.current = send;
    return () => {
      instance.terminate();
      for (const helper of helpers) helper.terminate();
      worker.current = null;
      sendRequest.current = null;
    };
  }, []);

  useEffect(() => {
    if (request === null || typeof request === 'string') return;
    if (!worker.current) {
      // No Worker (an old browser or a test DOM): the same service on this thread, after this render.
      void Promise.resolve().then(() => {
        try {
          const response = createCoverageService().handle(request);
          setLast(response);
          setStatus({ state: 'ready', response });
        } catch (error) {
          setStatus({ state: 'error', message: (error as Error).message });
        }
      });
      return;
    }
    if (busy.current) {
      waiting.current = request;
      return;
    }
    sendRequest.current?.(request);
  }, [request]);

  // A request that could not be made (a message instead) is shown as it is.
  if (typeof request === 'string') return { status: { state: 'error', message: request }, last };
  return { status, last };
}
