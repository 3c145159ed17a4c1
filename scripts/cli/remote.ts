/**
 * The command line's HTTP client: the server at BRANCHLINE_URL (default http://localhost:3000) with the personal
 * API token in BRANCHLINE_TOKEN (made on the account page) as `Authorization: Bearer …`. An error answer becomes a
 * CommandFailure with the server's message and fields, and the exit code for its status (failure.ts).
 */
import { CommandFailure, EXIT, type ExitCode } from "./failure";

export interface Remote {
  url: string;
  token: string | null;
}

export function remoteFromEnv(env: NodeJS.ProcessEnv = process.env): Remote {
  const url = (env.BRANCHLINE_URL ?? "http://localhost:3000").replace(/\/+$/, "");
  const token = env.BRANCHLINE_TOKEN?.trim() || null;
  return { url, token };
}

export function requireToken(remote: Remote): Remote & { token: string } {
  if (!remote.token) throw new CommandFailure(EXIT.badInput, ["set BRANCHLINE_TOKEN to a personal API token (make one on your account page)"]);
  return remote as Remote & { token: string };
}

function exitCodeFor(status: number): ExitCode {
  if (status === 401 || status === 403 || status === 404) return EXIT.refused;
  if (status === 409) return EXIT.stale;
  if (status === 429 || status >= 500) return EXIT.unavailable;
  return EXIT.badInput;
}

interface ErrorBody {
  error?: { code?: string; message?: string; fields?: { path: string; message: string }[] };
}

export interface RemoteAnswer {
  status: number;
  text: string;
  json<T>(): T;
}

/** One request; an error status throws its CommandFailure unless `allow` lists it. */
export async function send(remote: Remote, method: string, path: string, body?: unknown, allow: number[] = []): Promise<RemoteAnswer> {
  const headers: Record<string, string> = { accept: "application/json" };
  if (remote.token) headers.authorization = `Bearer ${remote.token}`;
  if (body !== undefined) headers["content-type"] = "application/json";
  let response: Response;
  try {
    response = await fetch(`${remote.url}${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  } catch (error) {
    throw new CommandFailure(EXIT.unavailable, [`cannot reach ${remote.url} (BRANCHLINE_URL): ${(error as Error).cause ?? (error as Error).message}`]);
  }
  const text = await response.text();
  const answer: RemoteAnswer = { status: response.status, text, json: <T>() => JSON.parse(text) as T };
  if (response.ok || allow.includes(response.status)) return answer;
  let parsed: ErrorBody = {};
  try {
    parsed = JSON.parse(text) as ErrorBody;
  } catch {
    /* not JSON: the status says enough */
  }
  const message = parsed.error?.message ?? `the server answered ${response.status}`;
  const fields = (parsed.error?.fields ?? []).map((f) => `  ${f.path || "(request)"}: ${f.message}`);
  throw new CommandFailure(exitCodeFor(response.status), [`${method} ${path}: ${response.status} ${message}`, ...fields]);
}
