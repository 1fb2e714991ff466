import { launchAppServer } from "./launch-app-server";

/** Start `next start` from the test build on 127.0.0.1 and wait until /api/health answers 200. */
export async function startAppServer(opts: { port: number; env: Record<string, string> }): Promise<{
  url: string;
  /** Stop the server: SIGTERM lets it finish; SIGKILL cuts it off mid-request. */
  stop: (signal?: NodeJS.Signals) => Promise<void>;
}> {
  const server = launchAppServer({ ...opts, inherit: true });
  if ((await server.outcome) !== "healthy") {
    await server.stop("SIGKILL");
    throw new Error(`app did not become healthy within 60 s:\n${server.output()}`);
  }
  return { url: server.url, stop: server.stop };
}
