import sharp from "sharp";
const [file, ...parts] = process.argv.slice(2);
const meta = await sharp(file).metadata();
const h = Number(parts[0] ?? 1300);
for (let top = 0, n = 1; top < meta.height; top += h, n++) {
  await sharp(file).extract({ left: 0, top, width: meta.width, height: Math.min(h, meta.height - top) }).toFile(file.replace(/\.png$/, `-part${n}.png`));
}
console.log(meta.width, meta.height);
