import { writeFileSync } from 'node:fs';
import QRCode from 'qrcode';

/**
 * A Y4M file (uncompressed YUV 4:2:0, the format Chromium's fake camera reads) showing one QR code
 * in black on white with its quiet zone. No encoder needed: the luma plane is the picture.
 */
export function writeQrVideo(path: string, text: string, width = 640, height = 480, frames = 5): void {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const size = qr.modules.size;
  const scale = Math.floor((Math.min(width, height) * 0.8) / (size + 8));
  const left = Math.floor((width - size * scale) / 2);
  const top = Math.floor((height - size * scale) / 2);
  const luma = Buffer.alloc(width * height, 235);
  for (let y = 0; y < size * scale; y++) {
    for (let x = 0; x < size * scale; x++) {
      if (qr.modules.get(Math.floor(y / scale), Math.floor(x / scale))) luma[(top + y) * width + left + x] = 16;
    }
  }
  const chroma = Buffer.alloc((width / 2) * (height / 2) * 2, 128);
  const header = Buffer.from(`YUV4MPEG2 W${width} H${height} F10:1 Ip A1:1 C420jpeg\n`);
  const frame = Buffer.concat([Buffer.from('FRAME\n'), luma, chroma]);
  writeFileSync(path, Buffer.concat([header, ...Array.from({ length: frames }, () => frame)]));
}
