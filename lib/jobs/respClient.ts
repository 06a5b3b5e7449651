/**
 * A small Redis client for BullMQ over one TCP connection (RESP2, the Redis
 * serialisation protocol): it implements BullMQ's IRedisClient adapter
 * interface, so BullMQ needs no other Redis driver. Commands are written in
 * order and their replies matched in order; Lua scripts run by EVALSHA with
 * EVAL as the fallback; MULTI/EXEC and pipelines are batches on the same
 * connection. Replies have the shapes BullMQ's ioredis adapter passes on
 * (bulk strings as UTF-8 strings, arrays as arrays, HGETALL as an object).
 *
 * A connection lost after it was ready is re-opened with backoff (commands
 * in flight fail with ConnectionClosedError, as BullMQ expects of ioredis;
 * commands sent meanwhile wait for the new connection); after
 * `reconnectFor_ms` without success the client ends. Not supported: Redis
 * Cluster, TLS.
 */
import { createHash } from "node:crypto";
import { EventEmitter } from "node:events";
import net from "node:net";
import { Readable } from "node:stream";
import { ConnectionClosedError, type IRedisClient, type IRedisTransaction } from "bullmq";

export const RESP_DEFAULTS = {
  /** ms to wait for the TCP connection; default 10 s */
  connectTimeout_ms: 10_000,
  /** ms to keep trying to re-open a lost connection before the client ends; default 60 s */
  reconnectFor_ms: 60_000,
  /** first delay between reconnection attempts, ms, doubled up to 2 s; default 100 */
  reconnectDelay_ms: 100,
};

export interface RespOptions {
  host: string;
  port: number;
  db: number;
  password?: string;
  username?: string;
  connectionName?: string;
  connectTimeout_ms: number;
  reconnectFor_ms?: number;
  reconnectDelay_ms?: number;
  /** BullMQ reads this: must be null on blocking connections */
  maxRetriesPerRequest: null;
  [key: string]: unknown;
}

type Arg = string | number | Buffer;
type Reply = string | number | null | Error | Reply[];

/** Parses redis://[user:password@]host:port[/db] into client options. */
export function parseRedisUrl(url: string): RespOptions {
  let u: URL;
  try {
    u = new URL(url);
  } catch {
    throw new Error(`REDIS_URL: expected redis://host:port[/db], got ${JSON.stringify(url)}`);
  }
  if (u.protocol !== "redis:")
    throw new Error(`REDIS_URL: only redis:// URLs are supported (no TLS), got ${u.protocol}`);
  return {
    host: u.hostname.replace(/^\[|\]$/g, "") || "127.0.0.1",
    port: Number(u.port || 6379),
    db: Number(u.pathname.slice(1) || 0),
    password: u.password ? decodeURIComponent(u.password) : undefined,
    username: u.username ? decodeURIComponent(u.username) : undefined,
    connectTimeout_ms: RESP_DEFAULTS.connectTimeout_ms,
    maxRetriesPerRequest: null,
  };
}

function encode(args: Arg[]): Buffer {
  const parts: Buffer[] = [Buffer.from(`*${args.length}\r\n`)];
  for (const a of args) {
    const b = Buffer.isBuffer(a) ? a : Buffer.from(String(a));
    parts.push(Buffer.from(`$${b.length}\r\n`), b, Buffer.from("\r\n"));
  }
  return Buffer.concat(parts);
}

const INCOMPLETE = Symbol("incomplete");

/** One reply from `buf` at `pos`: [value, next position], or INCOMPLETE. */
function parseReply(buf: Buffer, pos: number): [Reply, number] | typeof INCOMPLETE {
  if (pos >= buf.length) return INCOMPLETE;
  const eol = buf.indexOf("\r\n", pos);
  if (eol < 0) return INCOMPLETE;
  const type = buf[pos];
  const line = buf.toString("utf8", pos + 1, eol);
  switch (type) {
    case 43: // +
      return [line, eol + 2];
    case 45: // -
      return [new Error(line), eol + 2];
    case 58: // :
      return [Number(line), eol + 2];
    case 36: {
      // $
      const n = Number(line);
      if (n < 0) return [null, eol + 2];
      if (buf.length < eol + 2 + n + 2) return INCOMPLETE;
      return [buf.toString("utf8", eol + 2, eol + 2 + n), eol + 2 + n + 2];
    }
    case 42: {
      // *
      const n = Number(line);
      if (n < 0) return [null, eol + 2];
      const out: Reply[] = [];
      let p = eol + 2;
      for (let i = 0; i < n; i++) {
        const r = parseReply(buf, p);
        if (r === INCOMPLETE) return INCOMPLETE;
        out.push(r[0]);
        p = r[1];
      }
      return [out, p];
    }
    default:
      throw new Error(`redis: unexpected reply type ${String.fromCharCode(type)}`);
  }
}

/** Flattens nested argument arrays (as BullMQ's script calls pass them); bytes stay bytes. */
const flat = (args: unknown[]): Arg[] =>
  args.flatMap((a): Arg[] => {
    if (Array.isArray(a)) return flat(a);
    if (Buffer.isBuffer(a)) return [a];
    if (a instanceof Uint8Array) return [Buffer.from(a.buffer, a.byteOffset, a.byteLength)];
    if (a === undefined || a === null) return [""];
    return [typeof a === "number" ? a : String(a)];
  });

const toObject = (r: Reply): Record<string, string> => {
  const o: Record<string, string> = {};
  const a = (r ?? []) as string[];
  for (let i = 0; i + 1 < a.length; i += 2) o[a[i]] = a[i + 1];
  return o;
};

interface Pending {
  resolve: (r: Reply) => void;
  reject: (e: Error) => void;
}

interface Script {
  numberOfKeys: number;
  lua: string;
  sha: string;
}

export class RespClient extends EventEmitter implements IRedisClient {
  status = "wait";
  readonly isCluster = false;
  options: RespOptions;
  private socket: net.Socket | null = null;
  private buffer: Buffer = Buffer.alloc(0);
  private readonly pending: Pending[] = [];
  private readonly scripts = new Map<string, Script>();
  private connecting: Promise<void> | null = null;
  /** set by disconnect/quit: a close is then the end, not a loss */
  private closing = false;
  /** commands sent while reconnecting, written once the connection is back */
  private offline: { commands: Arg[][]; pending: Pending[] }[] = [];

  constructor(options: RespOptions | string) {
    super();
    this.options = typeof options === "string" ? parseRedisUrl(options) : { ...options };
  }

  connect(): Promise<void> {
    if (this.connecting) return this.connecting;
    this.status = "connecting";
    this.connecting = this.open();
    return this.connecting;
  }

  /** Opens the socket and runs the handshake (AUTH, SELECT, CLIENT SETNAME). */
  private open(): Promise<void> {
    return new Promise<void>((resolve, reject) => {
      const socket = net.connect({ host: this.options.host, port: this.options.port });
      this.socket = socket;
      socket.setNoDelay(true);
      let opened = false;
      const timer = setTimeout(
        () => socket.destroy(new Error(`redis: no connection to ${this.options.host}:${this.options.port}`)),
        this.options.connectTimeout_ms,
      );
      socket.once("connect", async () => {
        clearTimeout(timer);
        try {
          const handshake: Arg[][] = [];
          if (this.options.password) {
            handshake.push(
              this.options.username
                ? ["AUTH", this.options.username, this.options.password]
                : ["AUTH", this.options.password],
            );
          }
          if (this.options.db) handshake.push(["SELECT", this.options.db]);
          if (this.options.connectionName) handshake.push(["CLIENT", "SETNAME", this.options.connectionName]);
          await Promise.all(this.write(handshake));
          opened = true;
          this.status = "ready";
          this.emit("connect");
          this.emit("ready");
          this.flushOffline();
          resolve();
        } catch (e) {
          reject(e);
          socket.destroy();
        }
      });
      socket.on("data", (chunk) => this.onData(chunk));
      socket.on("error", (e) => {
        clearTimeout(timer);
        if (this.listenerCount("error") > 0) this.emit("error", e);
        if (!opened) {
          reject(e);
          // the first connection failed: the client ends (a lost connection is re-opened instead)
          if (this.status === "connecting") this.ended();
        }
      });
      socket.on("close", () => {
        clearTimeout(timer);
        if (this.socket !== socket) return;
        this.socket = null;
        this.buffer = Buffer.alloc(0);
        for (const p of this.pending.splice(0)) p.reject(new ConnectionClosedError());
        if (!opened && this.status !== "reconnecting") {
          reject(new ConnectionClosedError());
          this.ended();
        } else if (this.closing) this.ended();
        else if (opened) this.reconnect();
        else reject(new ConnectionClosedError());
      });
    });
  }

  /** Re-opens a lost connection with backoff; ends the client after reconnectFor_ms. */
  private reconnect(): void {
    this.status = "reconnecting";
    this.emit("close");
    this.emit("reconnecting");
    const giveUpAt = Date.now() + (this.options.reconnectFor_ms ?? RESP_DEFAULTS.reconnectFor_ms);
    let delay = this.options.reconnectDelay_ms ?? RESP_DEFAULTS.reconnectDelay_ms;
    const attempt = () => {
      if (this.closing) return this.ended();
      this.open().catch(() => {
        if (this.closing || Date.now() > giveUpAt) return this.ended();
        delay = Math.min(2 * delay, 2000);
        setTimeout(attempt, delay).unref();
      });
    };
    setTimeout(attempt, delay).unref();
  }

  private flushOffline(): void {
    for (const { commands, pending } of this.offline.splice(0)) {
      this.write(commands).forEach((p, i) => {
        p.then(pending[i].resolve, pending[i].reject);
      });
    }
  }

  private onData(chunk: Buffer): void {
    this.buffer = this.buffer.length ? Buffer.concat([this.buffer, chunk]) : chunk;
    let pos = 0;
    for (;;) {
      const r = parseReply(this.buffer, pos);
      if (r === INCOMPLETE) break;
      pos = r[1];
      const p = this.pending.shift();
      if (!p) continue;
      if (r[0] instanceof Error) p.reject(r[0]);
      else p.resolve(r[0]);
    }
    this.buffer = pos >= this.buffer.length ? Buffer.alloc(0) : this.buffer.subarray(pos);
  }

  private ended(): void {
    if (this.status === "end") return;
    this.status = "end";
    this.socket = null;
    for (const p of this.pending.splice(0)) p.reject(new ConnectionClosedError());
    for (const o of this.offline.splice(0)) for (const p of o.pending) p.reject(new ConnectionClosedError());
    this.emit("close");
    this.emit("end");
  }

  /** Sends one command; resolves to its reply, rejects with the server's error. */
  call(...args: unknown[]): Promise<Reply> {
    return this.send([flat(args)])[0];
  }

  /** Writes several commands at once; one promise per command, in order (held while reconnecting). */
  send(commands: Arg[][]): Promise<Reply>[] {
    if (this.status === "reconnecting") {
      const pending: Pending[] = [];
      const promises = commands.map(() => new Promise<Reply>((resolve, reject) => pending.push({ resolve, reject })));
      this.offline.push({ commands, pending });
      return promises;
    }
    if (this.status !== "ready") return commands.map(() => Promise.reject(new ConnectionClosedError()));
    return this.write(commands);
  }

  private write(commands: Arg[][]): Promise<Reply>[] {
    const socket = this.socket;
    if (!socket) return commands.map(() => Promise.reject(new ConnectionClosedError()));
    const promises = commands.map(
      () => new Promise<Reply>((resolve, reject) => this.pending.push({ resolve, reject })),
    );
    socket.write(Buffer.concat(commands.map(encode)));
    return promises;
  }

  disconnect(): void {
    this.closing = true;
    this.socket?.destroy();
    this.ended();
  }

  async quit(): Promise<string> {
    this.closing = true;
    if (this.status !== "ready") {
      this.disconnect();
      return "OK";
    }
    try {
      await this.call("QUIT");
    } catch {
      // closed already
    }
    this.disconnect();
    return "OK";
  }

  duplicate(overrides: Partial<RespOptions> = {}): IRedisClient {
    const dup = new RespClient({ ...this.options, ...overrides });
    for (const [name, s] of this.scripts) dup.defineCommand(name, s);
    return dup;
  }

  defineCommand(name: string, definition: { numberOfKeys: number; lua: string }): void {
    const sha = createHash("sha1").update(definition.lua).digest("hex");
    this.scripts.set(name, { numberOfKeys: definition.numberOfKeys, lua: definition.lua, sha });
  }

  private script(name: string): Script {
    const s = this.scripts.get(name);
    if (!s) throw new Error(`redis: no script named ${name}`);
    return s;
  }

  async runCommand(name: string, args: unknown[]): Promise<Reply> {
    const s = this.script(name);
    const a = flat(args);
    try {
      return await this.call("EVALSHA", s.sha, s.numberOfKeys, ...a);
    } catch (e) {
      if (!(e instanceof Error) || !e.message.startsWith("NOSCRIPT")) throw e;
      return this.call("EVAL", s.lua, s.numberOfKeys, ...a);
    }
  }

  /** Loads scripts by SHA so that batched EVALSHA cannot miss. */
  async loadScripts(names: Iterable<string>): Promise<void> {
    for (const n of new Set(names)) await this.call("SCRIPT", "LOAD", this.script(n).lua);
  }

  scriptSha(name: string): { sha: string; numberOfKeys: number } {
    return this.script(name);
  }

  multi(): IRedisTransaction {
    return new RespBatch(this, true);
  }

  pipeline(): IRedisTransaction {
    return new RespBatch(this, false);
  }

  async hgetall(key: string) {
    return toObject(await this.call("HGETALL", key));
  }
  async hget(key: string, field: string) {
    return (await this.call("HGET", key, field)) as string | null;
  }
  async hmget(key: string, ...fields: string[]) {
    return (await this.call("HMGET", key, ...fields)) as (string | null)[];
  }
  async hset(key: string, data: Record<string, string | number>) {
    return (await this.call("HSET", key, ...Object.entries(data).flat())) as number;
  }
  async hdel(key: string, ...fields: string[]) {
    return (await this.call("HDEL", key, ...fields)) as number;
  }
  async hexists(key: string, field: string) {
    return (await this.call("HEXISTS", key, field)) as number;
  }
  async get(key: string) {
    return (await this.call("GET", key)) as string | null;
  }
  async set(key: string, value: string | number, options?: { PX?: number; EX?: number }) {
    const extra = options?.PX != null ? ["PX", options.PX] : options?.EX != null ? ["EX", options.EX] : [];
    return (await this.call("SET", key, value, ...extra)) as string | null;
  }
  async del(...keys: string[]) {
    return (await this.call("DEL", ...keys)) as number;
  }
  async zrange(key: string, start: number, end: number, options?: { WITHSCORES?: boolean }) {
    return (await this.call("ZRANGE", key, start, end, ...(options?.WITHSCORES ? ["WITHSCORES"] : []))) as string[];
  }
  async zrevrange(key: string, start: number, end: number, options?: { WITHSCORES?: boolean }) {
    return (await this.call("ZREVRANGE", key, start, end, ...(options?.WITHSCORES ? ["WITHSCORES"] : []))) as string[];
  }
  async zcard(key: string) {
    return (await this.call("ZCARD", key)) as number;
  }
  async zscore(key: string, member: string) {
    return (await this.call("ZSCORE", key, member)) as string | null;
  }
  async lrange(key: string, start: number, end: number) {
    return (await this.call("LRANGE", key, start, end)) as string[];
  }
  async llen(key: string) {
    return (await this.call("LLEN", key)) as number;
  }
  async ltrim(key: string, start: number, end: number) {
    return (await this.call("LTRIM", key, start, end)) as string;
  }
  async lpos(key: string, value: string) {
    return (await this.call("LPOS", key, value)) as number | null;
  }
  async smembers(key: string) {
    return (await this.call("SMEMBERS", key)) as string[];
  }
  async xadd(
    key: string,
    id: string,
    fields: Record<string, string | number>,
    options?: { MAXLEN?: number; approximate?: boolean },
  ) {
    const trim =
      options?.MAXLEN != null ? ["MAXLEN", ...(options.approximate !== false ? ["~"] : []), options.MAXLEN] : [];
    return (await this.call("XADD", key, ...trim, id, ...Object.entries(fields).flat())) as string;
  }
  async xread(streams: { key: string; id: string }[], options?: { BLOCK?: number; COUNT?: number }) {
    return this.call(
      "XREAD",
      ...(options?.BLOCK != null ? ["BLOCK", options.BLOCK] : []),
      ...(options?.COUNT != null ? ["COUNT", options.COUNT] : []),
      "STREAMS",
      ...streams.map((s) => s.key),
      ...streams.map((s) => s.id),
    );
  }
  async xtrim(key: string, strategy: "MAXLEN", threshold: number, options?: { approximate?: boolean }) {
    return (await this.call(
      "XTRIM",
      key,
      strategy,
      ...(options?.approximate !== false ? ["~"] : []),
      threshold,
    )) as number;
  }
  async bzpopmin(key: string, timeout: number) {
    return (await this.call("BZPOPMIN", key, timeout)) as [string, string, string] | null;
  }
  async info() {
    return (await this.call("INFO")) as string;
  }
  clientSetName(name: string) {
    this.options.connectionName = name;
    return this.call("CLIENT", "SETNAME", name);
  }
  async clientList() {
    return (await this.call("CLIENT", "LIST")) as string;
  }
  async clientInfo() {
    return (await this.call("CLIENT", "INFO")) as string;
  }
  async scan(cursor: string | number, options: { MATCH?: string; COUNT?: number }) {
    const r = (await this.call(
      "SCAN",
      cursor,
      ...(options?.MATCH != null ? ["MATCH", options.MATCH] : []),
      ...(options?.COUNT != null ? ["COUNT", options.COUNT] : []),
    )) as [string, string[]];
    return r;
  }
  scanStream(options: { match: string; count?: number }): Readable {
    let cursor = "0";
    let finished = false;
    const client = this;
    return new Readable({
      objectMode: true,
      async read() {
        if (finished) return;
        try {
          const [next, keys] = await client.scan(cursor, { MATCH: options.match, COUNT: options.count });
          cursor = next;
          if (next === "0") finished = true;
          this.push(keys);
          if (finished) this.push(null);
        } catch (e) {
          this.destroy(e as Error);
        }
      },
    });
  }
  async keys(pattern: string) {
    return (await this.call("KEYS", pattern)) as string[];
  }
  async exists(...keys: string[]) {
    return (await this.call("EXISTS", ...keys)) as number;
  }
  async incr(key: string) {
    return (await this.call("INCR", key)) as number;
  }
}

/** MULTI/EXEC (atomic) or a pipeline (batched): commands queued, sent together by exec(). */
class RespBatch implements IRedisTransaction {
  private readonly commands: Arg[][] = [];
  private readonly scriptNames: string[] = [];

  constructor(
    private readonly client: RespClient,
    private readonly atomic: boolean,
  ) {}

  private add(...args: unknown[]): this {
    this.commands.push(flat(args));
    return this;
  }
  hgetall(key: string) {
    return this.add("HGETALL", key);
  }
  hset(key: string, data: Record<string, string | number>) {
    return this.add("HSET", key, ...Object.entries(data).flat());
  }
  hscan(key: string, cursor: string | number, options?: { COUNT?: number }) {
    return this.add("HSCAN", key, cursor, ...(options?.COUNT != null ? ["COUNT", options.COUNT] : []));
  }
  smembers(key: string) {
    return this.add("SMEMBERS", key);
  }
  sscan(key: string, cursor: string | number, options?: { COUNT?: number }) {
    return this.add("SSCAN", key, cursor, ...(options?.COUNT != null ? ["COUNT", options.COUNT] : []));
  }
  zrange(key: string, start: number, end: number) {
    return this.add("ZRANGE", key, start, end);
  }
  lrange(key: string, start: number, end: number) {
    return this.add("LRANGE", key, start, end);
  }
  llen(key: string) {
    return this.add("LLEN", key);
  }
  del(...keys: string[]) {
    return this.add("DEL", ...keys);
  }
  runCommand(name: string, args: unknown[]) {
    const s = this.client.scriptSha(name);
    this.scriptNames.push(name);
    return this.add("EVALSHA", s.sha, s.numberOfKeys, ...flat(args));
  }

  async exec(): Promise<[Error | null, unknown][] | null> {
    if (this.commands.length === 0) return [];
    if (this.scriptNames.length) await this.client.loadScripts(this.scriptNames);
    const hgetall = this.commands.map((c) => String(c[0]) === "HGETALL");
    const shape = (r: Reply, i: number) => (hgetall[i] ? toObject(r) : r);
    if (this.atomic) {
      const replies = this.client.send([["MULTI"], ...this.commands, ["EXEC"]]);
      const settled = await Promise.allSettled(replies);
      const exec = settled[settled.length - 1];
      if (exec.status === "rejected") throw exec.reason;
      if (exec.value === null) return null;
      return (exec.value as Reply[]).map((r, i) => (r instanceof Error ? [r, null] : [null, shape(r, i)]));
    }
    const settled = await Promise.allSettled(this.client.send(this.commands));
    return settled.map((s, i) => (s.status === "rejected" ? [s.reason as Error, null] : [null, shape(s.value, i)]));
  }
}
