// Polls a route's loader with a fetcher while `waiting` holds (the success pages waiting for the
// webhook): one request at a time, every `everyMs`, and it stops by itself after `maxTries`.
import { useEffect, useRef } from "react";
import { useFetcher } from "react-router";

export function usePoll<T>(href: string, waiting: (data: T | undefined) => boolean, everyMs = 1500, maxTries = 60) {
  const fetcher = useFetcher();
  const tries = useRef(0);
  const current = fetcher.data as T | undefined;
  const still = waiting(current);
  useEffect(() => {
    if (!still || fetcher.state !== "idle" || tries.current >= maxTries) return;
    const timer = setTimeout(() => {
      tries.current += 1;
      fetcher.load(href);
    }, everyMs);
    return () => clearTimeout(timer);
  }, [still, fetcher.state, fetcher, href, everyMs, maxTries]);
  return { data: current, gaveUp: still && tries.current >= maxTries };
}
