import QRCode, { type QRCodeToStringOptions } from "qrcode";

/**
 * How pass QRs are drawn: error correction H (about 30 % of the symbol can be lost to glare,
 * a scratch or a crease — ISO/IEC 18004 level H) and the 4-module quiet zone that standard asks
 * for, dark on white.
 */
export const passQrOptions = {
  errorCorrectionLevel: "H",
  margin: 4,
  color: { dark: "#000000", light: "#ffffff" },
} as const satisfies Omit<QRCodeToStringOptions, "type">;

/** The pass URL as an SVG QR code (a string of markup, drawn on the server, shown inline). */
export function passQrSvg(url: string): Promise<string> {
  return QRCode.toString(url, { ...passQrOptions, type: "svg" });
}
