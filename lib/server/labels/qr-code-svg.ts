import "server-only";
import QRCode from "qrcode";

/**
 * A QR code as an SVG string holding just the lab number's text, so any scanner that types what it
 * reads into the search box opens the item. Error correction M survives a scuffed label.
 */
export async function qrCodeSvg(labNumber: string): Promise<string> {
  return QRCode.toString(labNumber, { type: "svg", margin: 1, errorCorrectionLevel: "M" });
}
