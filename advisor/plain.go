package advisor

import (
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
)

// The age of the universe, 13.787 Gyr (Planck Collaboration, "Planck 2018
// results. VI. Cosmological parameters", 2020, Table 2), in days: a
// half-life beyond it is said in words, its logarithm kept in the scales.
var log10UniverseDays = math.Log10(13.787e9 * 365.25)

// largestPlainRatio is the largest stability ratio printed as a power of
// ten; a larger one means no aggregation on any time scale a product has.
const largestPlainRatio = 30

// plainTexts sets the text facts that the explanations print in place of
// logarithms no one can picture: the aggregation half-life in hours, days
// minutes, seconds or years, and the stability ratio as a power of ten.
func (ev *evaluation) plainTexts() {
	f := ev.facts
	f.SetText("aggregation_half_life_text", halfLifeText(f.Number("log10_aggregation_half_life_days")))
	f.SetText("stability_ratio_text", stabilityRatioText(f.Number("log10_stability_ratio")))
}

// halfLifeText says a half-life given as log10 of days.
func halfLifeText(log10Days float64) string {
	switch {
	case math.IsNaN(log10Days):
		return "unknown"
	case math.IsInf(log10Days, 1):
		return "without end (no well to aggregate into)"
	case log10Days > log10UniverseDays:
		return "longer than the age of the universe"
	}
	days := math.Pow(10, log10Days)
	seconds := days * input.Day
	switch {
	case seconds < 60:
		return number.Quantity(seconds, "s")
	case seconds < 3600:
		return number.Quantity(seconds/60, "min")
	case days < 1:
		return number.Quantity(seconds/3600, "h")
	case days < 1000:
		return number.Quantity(days, "days")
	}
	return number.Quantity(days/365.25, "years")
}

// stabilityRatioText says a stability ratio given as its logarithm.
func stabilityRatioText(log10W float64) string {
	switch {
	case math.IsNaN(log10W):
		return "unknown"
	case math.IsInf(log10W, 1):
		return "unbounded (no well to aggregate into)"
	case log10W > largestPlainRatio:
		return "above 10^30 (no aggregation on any time scale)"
	}
	return "10^" + number.Quantity(log10W, "")
}
