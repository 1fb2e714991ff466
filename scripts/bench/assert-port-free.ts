import { connect } from "node:net";

/**
 * Refuse to go on when something already listens on 127.0.0.1:`port`: the bench would otherwise
 * measure (or health-check) another server. Bounded: one connection attempt, 2 s at most.
 */
export async function assertPortFree(port: number, what: string): Promise<void> {
  const taken = await new Promise<boolean>((resolve) => {
    const socket = connect({ host: "127.0.0.1", port });
    const done = (answer: boolean) => {
      socket.destroy();
      resolve(answer);
    };
    socket.setTimeout(2000, () => done(false));
    socket.once("connect", () => done(true));
    socket.once("error", () => done(false));
  });
  if (taken)
    throw new Error(
      `port ${port} (${what}) is in use on 127.0.0.1: stop what runs there or choose another with PLUMBLINE_BENCH_*_PORT`,
    );
}
