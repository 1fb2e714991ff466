import { NextResponse } from "next/server";

/**
 * A CSV body as a file download: UTF-8 text/csv with a header line (RFC 4180 §3, RFC 7111),
 * `attachment` with an ASCII file name (RFC 6266), never cached (the results change all day).
 * @param name the file name's stem, reduced to letters, digits and dashes
 */
export function csvDownload(csv: string, name: string): NextResponse {
  const stem = name.replace(/[^a-z0-9-]/gi, "").slice(0, 120) || "plumbline";
  return new NextResponse(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8; header=present",
      "content-disposition": `attachment; filename="${stem}.csv"`,
      "cache-control": "no-store",
    },
  });
}
