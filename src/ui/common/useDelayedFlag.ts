import { useEffect, useState } from "react";

/**
 * `flag`, but only once it has stayed true for `delayMs`: a busy mark that a quick job would only
 * flash is not drawn (common practice for progress indicators). Each mark drawn is also page work
 * that competes with the ranking workers for the cores.
 */
export function useDelayedFlag(flag: boolean, delayMs: number): boolean {
  const [shown, setShown] = useState(false);
  useEffect(() => {
    if (!flag) return;
    const timer = setTimeout(() => setShown(true), delayMs);
    return () => {
      clearTimeout(timer);
      setShown(false);
    };
  }, [flag, delayMs]);
  return flag && shown;
}
