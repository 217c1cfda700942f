// A QR code of a share link for posters, drawn on the server as SVG (it scales to any poster
// size) and handed to the page as a data: URL, which the CSP's img-src allows.
import QRCode from 'qrcode';

// The public page is the busiest page on a club night and its link never changes, so each
// code is drawn once; a small bound keeps the cache from growing with old links.
const cache = new Map<string, string>();
const CACHE_SIZE = 200;

export async function qrDataUrl(text: string): Promise<string> {
	const hit = cache.get(text);
	if (hit) return hit;
	// Level M restores about 15 % of damaged modules (the qrcode package's documentation).
	const svg = await QRCode.toString(text, { type: 'svg', errorCorrectionLevel: 'M', margin: 2 });
	const url = `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}`;
	if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value!);
	cache.set(text, url);
	return url;
}
