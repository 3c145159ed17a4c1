/**
 * A progress bar on standard error for long work (cli-progress), shown only when standard error is a terminal, so
 * that logs and pipes get no control characters; standard output keeps the data alone.
 */
import cliProgress from "cli-progress";

export interface Progress {
  update(done: number, total: number): void;
  stop(): void;
}

export function progressBar(label: string, stream: NodeJS.WriteStream = process.stderr): Progress {
  if (!stream.isTTY) return { update: () => undefined, stop: () => undefined };
  const bar = new cliProgress.SingleBar({ stream, format: `${label} [{bar}] {value}/{total} points, {eta_formatted} left`, hideCursor: true, clearOnComplete: true }, cliProgress.Presets.shades_classic);
  let started = false;
  return {
    update(done, total) {
      if (!started) {
        bar.start(total, 0);
        started = true;
      }
      bar.update(done);
    },
    stop: () => started && bar.stop(),
  };
}
