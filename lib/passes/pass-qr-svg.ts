import QRCode, { type QRCodeToStringOptions } from "qrcode";

/**
 * How pass QRs are drawn: error correction M, the 4-module quiet zone ISO/IEC 18004 asks for,
 * dark on white.
 *
 * Why M: the pass is shown on a phone screen, where what goes wrong is glare, low contrast and
 * modules too small for the scanning camera, not the creases and dirt level H (30 %) is for on
 * paper. At the same screen width a lower level means a smaller symbol and bigger modules: a pass
 * URL is version 14 (73 modules) at M against version 20 (97) at H, each module a third larger.
 * M still restores about 15 % of the codewords — a glare patch or a thumb over an edge. L (7 %)
 * would save one more version, too little to give up that margin.
 */
export const passQrOptions = {
  errorCorrectionLevel: "M",
  margin: 4,
  color: { dark: "#000000", light: "#ffffff" },
} as const satisfies Omit<QRCodeToStringOptions, "type">;

/** The pass URL as an SVG QR code (a string of markup, drawn on the server, shown inline). */
export function passQrSvg(url: string): Promise<string> {
  return QRCode.toString(url, { ...passQrOptions, type: "svg" });
}
