import sharp from "sharp";

// A drawn illustration standing in for a placement photo: a stylised forearm with two electrodes and their leads.
// Generated here, so no photograph of a real person is ever part of the demo.
export async function demoPlacementIllustration(): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="800" viewBox="0 0 1200 800">
    <rect width="1200" height="800" fill="#e9e4da"/>
    <rect x="0" y="560" width="1200" height="240" fill="#cfc4af"/>
    <path d="M80 430 C 300 380, 700 360, 1000 390 C 1080 398, 1140 420, 1160 450 C 1140 490, 1080 505, 1000 505 C 700 520, 300 520, 80 520 Z" fill="#c99b7a"/>
    <rect x="380" y="395" width="130" height="110" rx="55" fill="#f4f4f4" stroke="#8a8a8a" stroke-width="4"/>
    <rect x="640" y="390" width="130" height="110" rx="55" fill="#f4f4f4" stroke="#8a8a8a" stroke-width="4"/>
    <path d="M445 395 C 445 300, 520 250, 600 240" stroke="#333" stroke-width="8" fill="none"/>
    <path d="M705 390 C 705 300, 650 250, 600 240" stroke="#555" stroke-width="8" fill="none"/>
    <text x="60" y="90" font-family="sans-serif" font-size="44" fill="#1b2633">Illustration: electrodes on the back of the forearm</text>
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 90 }).toBuffer();
}

// A drawn illustration standing in for a photo of skin redness under an electrode's outline.
export async function demoRednessIllustration(): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1000" height="750" viewBox="0 0 1000 750">
    <rect width="1000" height="750" fill="#d9b595"/>
    <rect x="330" y="230" width="340" height="290" rx="140" fill="#d98e7a" stroke="#b96a5a" stroke-width="6" stroke-dasharray="18 12"/>
    <text x="40" y="70" font-family="sans-serif" font-size="40" fill="#1b2633">Illustration: redness within an electrode outline</text>
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 90 }).toBuffer();
}
