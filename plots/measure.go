package plots

import (
	"fmt"
	"strings"

	"cleft/planes"
)

// Measure is the quantity a tendency stereonet shows.
type Measure int

const (
	SlipTendency Measure = iota
	NormalisedSlip
	DilationTendency
	PressureToSlip
	FactorOfSafety
)

var measureNames = [...]string{"slip-tendency", "normalised-slip", "dilation-tendency", "pressure-to-slip", "factor-of-safety"}

// Measures lists the measure names, as the command line takes them.
func Measures() []string { return measureNames[:] }

// ParseMeasure reads a measure name (see Measures).
func ParseMeasure(s string) (Measure, error) {
	for i, n := range measureNames {
		if s == n {
			return Measure(i), nil
		}
	}
	return 0, fmt.Errorf("measure %q: want one of %s", s, strings.Join(measureNames[:], ", "))
}

func (m Measure) String() string { return measureNames[m] }

// Value returns the measure's value in r (NaN where undefined).
func (m Measure) Value(r *planes.Result) float64 {
	switch m {
	case SlipTendency:
		return r.SlipTendency
	case NormalisedSlip:
		return r.NormalisedSlip
	case DilationTendency:
		return r.DilationTendency
	case PressureToSlip:
		return r.PressureToSlip
	}
	return r.FactorOfSafety
}

// Label names the measure with its symbol and unit, for a colour bar.
func (m Measure) Label() string {
	switch m {
	case SlipTendency:
		return "slip tendency Ts = τ/σn'"
	case NormalisedSlip:
		return "normalised slip tendency Ts/Ts,max"
	case DilationTendency:
		return "dilation tendency Td = (σ1−σn)/(σ1−σ3)"
	case PressureToSlip:
		return "pressure to slip ΔPp (MPa)"
	}
	return "factor of safety"
}

// HighIsUnstable reports whether a larger value means a plane nearer to
// slipping (slip and dilation tendency) or further from it (factor of
// safety, pressure to slip). Figures put the unstable end at the light end
// of the colour ramp either way.
func (m Measure) HighIsUnstable() bool { return m <= DilationTendency }

// Direction says which end of the colour bar is which, for its note.
func (m Measure) Direction() string {
	switch m {
	case DilationTendency:
		return "lighter, to the right: more prone to open"
	case FactorOfSafety, PressureToSlip:
		return "lighter, to the left: nearer to slip"
	}
	return "lighter, to the right: nearer to slip"
}

// DefaultContours are the contour levels drawn when none are asked for.
func (m Measure) DefaultContours() []float64 {
	switch m {
	case SlipTendency:
		return []float64{0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8}
	case NormalisedSlip, DilationTendency:
		return []float64{0.2, 0.4, 0.6, 0.8}
	case PressureToSlip:
		return nil // chosen from the range of the field
	}
	return []float64{1.5, 2, 3}
}
