"use client";
import { useEffect, useState } from "react";

/**
 * Registers the shop view's service worker and asks it to keep this page, the scripts and fonts it
 * loaded and its data URLs, so the page opens again with no network. Answers true once they are kept.
 */
export function useOfflineReady(dataUrls: readonly string[]): boolean {
  const [ready, setReady] = useState(false);
  const key = dataUrls.join(" ");
  useEffect(() => {
    if (!("serviceWorker" in navigator) || !window.isSecureContext) return;
    let live = true;
    void (async () => {
      try {
        await navigator.serviceWorker.register("/shop-sw.js", { scope: "/" });
        const reg = await navigator.serviceWorker.ready;
        const here = location.origin;
        const loaded = performance
          .getEntriesByType("resource")
          .map((e) => e.name)
          .filter((u) => u.startsWith(here) && /\/(_next\/static|fonts)\//.test(u));
        const urlsToCache = [location.href.split("#")[0]!, ...new Set(loaded), ...key.split(" ").filter(Boolean)];
        const channel = new MessageChannel();
        const done = new Promise<boolean>((resolve) => (channel.port1.onmessage = () => resolve(true)));
        reg.active?.postMessage({ type: "CACHE_URLS", payload: { urlsToCache } }, [channel.port2]);
        if ((await done) && live) setReady(true);
      } catch {
        // No service worker (private mode, an old browser): the page still works online, and check-offs still queue on the phone.
      }
    })();
    return () => {
      live = false;
    };
  }, [key]);
  return ready;
}

/** Keeps the screen on while the page is visible, where the browser allows it (Screen Wake Lock API). */
export function useWakeLock(): boolean {
  const [held, setHeld] = useState(false);
  useEffect(() => {
    const nav = navigator as Navigator & { wakeLock?: { request(type: "screen"): Promise<{ release(): Promise<void>; addEventListener(t: "release", f: () => void): void }> } };
    if (!nav.wakeLock) return;
    let lock: Awaited<ReturnType<NonNullable<typeof nav.wakeLock>["request"]>> | null = null;
    const take = async () => {
      if (document.visibilityState !== "visible") return;
      try {
        lock = await nav.wakeLock!.request("screen");
        setHeld(true);
        lock.addEventListener("release", () => setHeld(false));
      } catch {
        setHeld(false);
      }
    };
    void take();
    document.addEventListener("visibilitychange", take);
    return () => {
      document.removeEventListener("visibilitychange", take);
      void lock?.release().catch(() => undefined);
    };
  }, []);
  return held;
}
