import { useEffect, useState } from 'react';

/**
 * The current time in ms, renewed every `intervalMs` while `running` (a countdown's clock).
 * Stops ticking when not running, so a finished countdown costs nothing.
 */
export function useNow(intervalMs: number, running = true): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!running) return;
    const timer = window.setInterval(() => setNow(Date.now()), intervalMs);
    return () => window.clearInterval(timer);
  }, [intervalMs, running]);
  return now;
}
