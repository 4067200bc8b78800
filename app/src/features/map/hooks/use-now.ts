import { useEffect, useState } from 'react';

/** The current time, refreshed every `intervalMs` (the terminator moves ≈ 0.25° a minute). */
export function useNow(intervalMs = 60_000): Date {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const timer = window.setInterval(() => setNow(new Date()), intervalMs);
    return () => window.clearInterval(timer);
  }, [intervalMs]);
  return now;
}
