// Runs the solver read-out when the browser is idle after the last change, so typing in a
// parameter box stays smooth; an answer for values since replaced is dropped.
import { useEffect, useState } from 'react';
import type { PotentialSpec } from '../../../../shared/spec/figure-spec';
import { potentialReadout, type Readout } from '../utils/potential-readout';

/** Longest wait for an idle moment before solving anyway, ms. */
const IDLE_TIMEOUT_MS = 400;

type IdleHandle = { cancel: () => void };

function whenIdle(run: () => void): IdleHandle {
  if (typeof window.requestIdleCallback === 'function') {
    const id = window.requestIdleCallback(run, { timeout: IDLE_TIMEOUT_MS });
    return { cancel: () => window.cancelIdleCallback(id) };
  }
  const id = window.setTimeout(run, 50);
  return { cancel: () => window.clearTimeout(id) };
}

export function useDeferredReadout(
  spec: PotentialSpec,
  ls: number[],
  levels: number,
  muRatio: number,
): { readout: Readout | null; pending: boolean } {
  const key = JSON.stringify([spec, ls, levels, muRatio]);
  const [done, setDone] = useState<{ key: string; readout: Readout } | null>(null);
  useEffect(() => {
    const handle = whenIdle(() =>
      setDone({ key, readout: potentialReadout(spec, ls, levels, muRatio) }),
    );
    return () => handle.cancel();
    // key stands for spec, ls, levels and muRatio.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  return { readout: done?.readout ?? null, pending: done?.key !== key };
}
