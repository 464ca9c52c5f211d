/**
 * The functions bundle makes no request of any kind. It is evaluated with recording stubs
 * of every way a page can reach the network (fetch, XMLHttpRequest, WebSocket, EventSource,
 * importScripts, navigator.sendBeacon, Image, Worker, WebTransport, RTCPeerConnection), every
 * function of functions.json is called with valid and with arbitrary arguments (promises awaited),
 * and not one stub may have been touched. Done twice: with only CustomFunctions (tests, demo) and
 * with an Office global present (Excel's shared runtime path, which reads the workbook's table at
 * start-up through Office, not the network).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadBundle } from '../bundle/harness';
import { argumentsFor, plausibleCell, settle } from './support';

function recordingNetwork(): { globals: Record<string, unknown>; calls: string[] } {
  const calls: string[] = [];
  const fn = (name: string) =>
    function (...args: unknown[]): never {
      calls.push(`${name}(${args.map((a) => String(a).slice(0, 60)).join(', ')})`);
      throw new Error(`${name} is not available`);
    };
  const ctor = (name: string) =>
    class {
      constructor(...args: unknown[]) {
        calls.push(`new ${name}(${args.map((a) => String(a).slice(0, 60)).join(', ')})`);
      }
    };
  const globals: Record<string, unknown> = {
    fetch: (...args: unknown[]) => {
      calls.push(`fetch(${String(args[0]).slice(0, 60)})`);
      return Promise.reject(new Error('no network'));
    },
    XMLHttpRequest: ctor('XMLHttpRequest'),
    WebSocket: ctor('WebSocket'),
    EventSource: ctor('EventSource'),
    Image: ctor('Image'),
    Worker: ctor('Worker'),
    SharedWorker: ctor('SharedWorker'),
    WebTransport: ctor('WebTransport'),
    RTCPeerConnection: ctor('RTCPeerConnection'),
    importScripts: fn('importScripts'),
    navigator: { sendBeacon: fn('navigator.sendBeacon'), userAgent: 'test' },
  };
  return { globals, calls };
}

/** An Office global on which Office.onReady answers as a host that is not Excel (no workbook to read). */
function officeStub(): Record<string, unknown> {
  return {
    Office: {
      onReady: () => Promise.resolve({ host: 'Word', platform: 'PC' }),
      HostType: { Excel: 'Excel', Word: 'Word' },
      context: { requirements: { isSetSupported: () => true } },
    },
    setTimeout,
    clearTimeout,
  };
}

const CASES = Number(process.env.FUZZ_NETWORK_CASES ?? 100);

describe('the functions bundle makes no request of any kind', () => {
  for (const withOffice of [false, true]) {
    it(withOffice ? 'with an Office global (shared runtime start-up)' : 'with only CustomFunctions', async () => {
      const net = recordingNetwork();
      const b = loadBundle({ ...net.globals, ...(withOffice ? officeStub() : {}) });
      expect(b.sandbox.fetch).toBe(net.globals.fetch); // the stubs are what the bundle sees
      // with Office present the bundle starts its workbook channel (and table look-ups wait for it)
      expect(b.sandbox.cellwrightFunctionsHost !== undefined).toBe(withOffice);
      let calls = 0;
      for (const meta of b.metadata.functions) {
        const valid = fc.sample(fc.tuple(...meta.parameters.map((p) => plausibleCell(p.name))), { numRuns: 20, seed: 7 });
        const arbitrary = fc.sample(argumentsFor(meta), { numRuns: CASES, seed: 11 });
        for (const args of [...valid, ...arbitrary]) {
          const s = await settle(() => b.call(meta.id, ...args));
          expect(s.ok, `${meta.id}: ${s.ok ? '' : s.problem}`).toBe(true);
          calls++;
        }
      }
      expect(calls).toBeGreaterThan(b.metadata.functions.length * 100);
      expect(net.calls).toEqual([]);
    });
  }
});
