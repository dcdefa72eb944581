import type { Server } from 'node:http';
import type { AppContext } from './context';

/** How long requests in flight and background jobs get before the database closes. */
export const SHUTDOWN_BUDGET_MS = 10_000;

export interface Running {
  ctx: AppContext;
  /** Null when a stop arrives before the server listens. */
  server: Server | null;
  /** The app's own close: session expiry timer, mailer, built-in SMTP server. */
  closeApp: () => Promise<void>;
}

/**
 * Stops in the order that loses nothing: no new connections, requests in flight answered
 * (up to the budget), background jobs stopped at a safe point, the search snapshot saved,
 * then the mail server and the database closed.
 */
export async function shutDown(running: Running, budgetMs = SHUTDOWN_BUDGET_MS): Promise<void> {
  const { ctx, server } = running;
  const deadline = Date.now() + budgetMs;
  if (server) await closeServer(server, budgetMs);
  // No new job or scheduled tick from here on (the digest is one); running jobs go on.
  await ctx.jobs.pause();
  const stopped = await ctx.background.stop(Math.max(deadline - Date.now(), 1_000));
  if (!stopped) {
    ctx.logger.warn(
      { running: ctx.background.size },
      'Background work still running at the end of the shutdown budget; closing anyway.',
    );
  }
  await ctx.searchIndex.settled();
  await ctx.searchIndex.saveSnapshot().catch((error: unknown) => {
    ctx.logger.warn({ err: error }, 'The search index snapshot could not be saved.');
  });
  await running.closeApp();
  await ctx.closeDatabase();
}

/** Stops accepting, lets requests in flight finish, and cuts what is left at the budget. */
async function closeServer(server: Server, budgetMs: number): Promise<void> {
  const closed = new Promise<void>((resolve) => server.close(() => resolve()));
  // A keep-alive connection that finishes its request goes idle; close it then, not after
  // its keep-alive timeout.
  const idle = setInterval(() => server.closeIdleConnections(), 100);
  const cut = setTimeout(() => server.closeAllConnections(), budgetMs);
  server.closeIdleConnections();
  await closed;
  clearInterval(idle);
  clearTimeout(cut);
}
