/**
 * The command line's store of diffuse fields (lib/photolysis/diffuseFieldStore.ts)
 * on disk: one file per column in a folder the launcher names after the
 * bundle's key (.engine/cli-fields-<key>/, so an edit to lib/ starts an empty
 * one), written on the first run at a sun and read by every later one. A file
 * is the field's numbers as bytes (a header of six 32-bit integers: format 1,
 * sunlit, first bin, bins, interfaces, flux values; then the interface
 * altitudes as float64 and the flux as float32), so a field read back is the
 * solved one bit for bit. Unreadable, short or foreign files are ignored and
 * the column solved; files are written to a temporary name and renamed, as
 * several runs may write at once (a temporary file an interrupted run left
 * is removed after an hour); at most `maxFiles` fields are kept (counted when
 * a run first writes, and by each run as it writes; beyond that a run solves
 * its columns and keeps none).
 */
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import type { DiffuseFieldStore } from "../photolysis/diffuseFieldStore";
import type { DiffuseField } from "../photolysis/radiativeColumn";

const FORMAT = 1;
const HEADER_BYTES = 24;

export const DISK_FIELD_STORE_DEFAULTS = {
  /** fields kept in the folder (one field of the reference grid is ~92 kB) */
  maxFiles: 2000,
};

export function diskFieldStore(dir: string, maxFiles = DISK_FIELD_STORE_DEFAULTS.maxFiles): DiffuseFieldStore {
  const file = (key: string) => path.join(dir, `${createHash("sha1").update(key).digest("hex").slice(0, 24)}.field`);
  /** fields in the folder as this run counts them; undefined until its first write */
  let count: number | undefined;
  return {
    get(key) {
      let buf: Buffer;
      try {
        buf = fs.readFileSync(file(key));
      } catch {
        return undefined;
      }
      return decodeField(buf);
    },
    put(key, field) {
      try {
        if (count === undefined) count = countFields(dir);
        if (count >= maxFiles) return;
        const target = file(key);
        const tmp = `${target}.${process.pid}.tmp`;
        fs.writeFileSync(tmp, encodeField(field));
        fs.renameSync(tmp, target);
        count++;
      } catch {} // a field that cannot be kept is solved again by the next run
    },
  };
}

/** The `.field` files in `dir` (made if missing); temporary files older than an hour are removed on the way. */
function countFields(dir: string): number {
  fs.mkdirSync(dir, { recursive: true });
  const hourAgo = Date.now() - 3_600_000;
  let n = 0;
  for (const name of fs.readdirSync(dir)) {
    if (name.endsWith(".field")) n++;
    else if (name.endsWith(".tmp"))
      try {
        if (fs.statSync(path.join(dir, name)).mtimeMs < hourAgo) fs.unlinkSync(path.join(dir, name));
      } catch {} // another run took it
  }
  return n;
}

export function encodeField(field: DiffuseField): Buffer {
  const nz = field.z_km.length;
  const buf = Buffer.alloc(HEADER_BYTES + 8 * nz + 4 * field.flux.length);
  const head = new Int32Array([FORMAT, field.sunlit ? 1 : 0, field.firstBin, field.bins, nz, field.flux.length]);
  Buffer.from(head.buffer).copy(buf, 0);
  Buffer.from(field.z_km.buffer, field.z_km.byteOffset, 8 * nz).copy(buf, HEADER_BYTES);
  Buffer.from(field.flux.buffer, field.flux.byteOffset, 4 * field.flux.length).copy(buf, HEADER_BYTES + 8 * nz);
  return buf;
}

/** The field in `buf`, or undefined when it is not a whole file of this format. */
export function decodeField(buf: Buffer): DiffuseField | undefined {
  if (buf.length < HEADER_BYTES) return undefined;
  // copied out, so that the arrays are aligned whatever the Buffer's offset
  const head = new Int32Array(buf.buffer.slice(buf.byteOffset, buf.byteOffset + HEADER_BYTES));
  const [format, sunlit, firstBin, bins, nz, n] = head;
  if (format !== FORMAT || (sunlit !== 0 && sunlit !== 1) || firstBin < 0 || bins < 0 || nz < 0) return undefined;
  // the flux is one value per interface and bin: a header that says otherwise is not a field of this format
  if (n !== nz * bins || buf.length !== HEADER_BYTES + 8 * nz + 4 * n) return undefined;
  const at = buf.byteOffset + HEADER_BYTES;
  return {
    sunlit: sunlit === 1,
    firstBin,
    bins,
    z_km: new Float64Array(buf.buffer.slice(at, at + 8 * nz)),
    flux: new Float32Array(buf.buffer.slice(at + 8 * nz, at + 8 * nz + 4 * n)),
  };
}
