/** Longest wait for idle time before idle work runs anyway (ms). */
const IDLE_TIMEOUT = 2000;

/** What an idle callback is told: how long the browser expects to stay idle (ms). */
export type IdleDeadline = { timeRemaining(): number; didTimeout: boolean };

/**
 * Runs `callback` when the page is idle (at the latest after IDLE_TIMEOUT); where the browser has no
 * idle callbacks (and in Node), after a short timer with an 8 ms budget.
 */
export const requestIdle: (callback: (deadline: IdleDeadline) => void) => void =
  typeof window !== 'undefined' && 'requestIdleCallback' in window
    ? (callback) => window.requestIdleCallback(callback, { timeout: IDLE_TIMEOUT })
    : (callback) => setTimeout(() => callback({ timeRemaining: () => 8, didTimeout: true }), 50);
