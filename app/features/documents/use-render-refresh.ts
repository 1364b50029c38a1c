// Reloads the page's data every two seconds while a PDF is queued or being made, so the status
// (and the download button) appear without the person reloading.
import { useEffect } from "react";
import { useRevalidator } from "react-router";

export function useRenderRefresh(waiting: boolean) {
  const revalidator = useRevalidator();
  useEffect(() => {
    if (!waiting) return;
    const timer = setInterval(() => {
      if (revalidator.state === "idle") void revalidator.revalidate();
    }, 2000);
    return () => clearInterval(timer);
  }, [waiting, revalidator]);
}
