// The cautions printed on every run sheet and e-mail, in one place so they read the same.
// Figures: WHO, Global standard for safe listening venues and events (2022).

export const SOUND_CAUTION =
	'Keep the average sound level at or below 100 dB LAeq over any 15 minutes, measured with ' +
	'calibrated equipment (WHO, Global standard for safe listening venues and events, 2022). ' +
	"Offer hearing protection and a quiet corner. The venue's own limits and local rules come first.";

// Rest, water, floor and footwear: common practice (no source); the venue's rules come first.
export const CARE_NOTE =
	'Call the breaks, keep water to hand, pace new dancers gently and watch the floor surface ' +
	"and footwear. Follow the venue's rules.";
