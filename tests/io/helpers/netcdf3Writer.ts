/**
 * A tiny netCDF-3 classic writer for test fixtures (no record dimension), following the
 * "NetCDF Classic Format Specification" (Unidata, netCDF Users Guide, file format appendix):
 * magic "CDF\x01", numrecs, dim_list, gatt_list, var_list, then the data, big-endian, each
 * name/attribute/variable block padded to 4 bytes.
 */
export type NcType = "char" | "short" | "int" | "float" | "double";
export type NcAttrValue = string | number | number[];
export interface NcAttr {
  name: string;
  type?: NcType;
  value: NcAttrValue;
}
export interface NcVar {
  name: string;
  dims: string[];
  type: NcType;
  attrs?: NcAttr[];
  /** Flat data in C order; strings for char variables (padded to the last dimension). */
  data: number[] | string[];
}
export interface NcFile {
  dims: Array<{ name: string; size: number }>;
  attrs?: NcAttr[];
  vars: NcVar[];
}

const TYPE_CODE: Record<NcType, number> = { char: 2, short: 3, int: 4, float: 5, double: 6 };
const TYPE_SIZE: Record<NcType, number> = { char: 1, short: 2, int: 4, float: 4, double: 8 };

class Bytes {
  parts: number[] = [];
  u8(v: number): void {
    this.parts.push(v & 0xff);
  }
  i32(v: number): void {
    const b = new DataView(new ArrayBuffer(4));
    b.setInt32(0, v);
    for (let i = 0; i < 4; i += 1) this.u8(b.getUint8(i));
  }
  value(type: NcType, v: number): void {
    const b = new DataView(new ArrayBuffer(8));
    if (type === "short") b.setInt16(0, v);
    else if (type === "int") b.setInt32(0, v);
    else if (type === "float") b.setFloat32(0, v);
    else if (type === "double") b.setFloat64(0, v);
    else b.setUint8(0, v);
    for (let i = 0; i < TYPE_SIZE[type]; i += 1) this.u8(b.getUint8(i));
  }
  pad(): void {
    while (this.parts.length % 4 !== 0) this.u8(0);
  }
  name(s: string): void {
    const bytes = new TextEncoder().encode(s);
    this.i32(bytes.length);
    bytes.forEach((x) => this.u8(x));
    this.pad();
  }
}

function attrType(a: NcAttr): NcType {
  return a.type ?? (typeof a.value === "string" ? "char" : "double");
}

function writeAttrs(out: Bytes, attrs: NcAttr[] | undefined): void {
  if (attrs === undefined || attrs.length === 0) {
    out.i32(0);
    out.i32(0);
    return;
  }
  out.i32(0x0c);
  out.i32(attrs.length);
  for (const a of attrs) {
    out.name(a.name);
    const t = attrType(a);
    out.i32(TYPE_CODE[t]);
    if (typeof a.value === "string") {
      const bytes = new TextEncoder().encode(a.value);
      out.i32(bytes.length);
      bytes.forEach((x) => out.u8(x));
    } else {
      const vals = Array.isArray(a.value) ? a.value : [a.value];
      out.i32(vals.length);
      vals.forEach((v) => out.value(t, v));
    }
    out.pad();
  }
}

function varBytes(v: NcVar, dimSize: (n: string) => number): Bytes {
  const b = new Bytes();
  if (v.type === "char") {
    const width = dimSize(v.dims[v.dims.length - 1]);
    for (const s of v.data as string[]) {
      const enc = new TextEncoder().encode(s);
      for (let i = 0; i < width; i += 1) b.u8(enc[i] ?? 0);
    }
  } else (v.data as number[]).forEach((x) => b.value(v.type, x));
  b.pad();
  return b;
}

/** Writes the file; returns its bytes. */
export function writeNetcdf3(file: NcFile): Uint8Array {
  const dimIndex = (n: string): number => file.dims.findIndex((d) => d.name === n);
  const dimSize = (n: string): number => file.dims[dimIndex(n)].size;
  const datas = file.vars.map((v) => varBytes(v, dimSize));
  const header = (offsets: number[]): Bytes => {
    const h = new Bytes();
    "CDF".split("").forEach((c) => h.u8(c.charCodeAt(0)));
    h.u8(1);
    h.i32(0);
    h.i32(0x0a);
    h.i32(file.dims.length);
    for (const d of file.dims) {
      h.name(d.name);
      h.i32(d.size);
    }
    writeAttrs(h, file.attrs);
    h.i32(0x0b);
    h.i32(file.vars.length);
    file.vars.forEach((v, i) => {
      h.name(v.name);
      h.i32(v.dims.length);
      v.dims.forEach((d) => h.i32(dimIndex(d)));
      writeAttrs(h, v.attrs);
      h.i32(TYPE_CODE[v.type]);
      h.i32(datas[i].parts.length);
      h.i32(offsets[i] ?? 0);
    });
    return h;
  };
  const size = header([]).parts.length;
  const offsets: number[] = [];
  let at = size;
  for (const d of datas) {
    offsets.push(at);
    at += d.parts.length;
  }
  const all = [...header(offsets).parts, ...datas.flatMap((d) => d.parts)];
  return Uint8Array.from(all);
}
