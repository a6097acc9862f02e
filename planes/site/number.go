package site

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"cleft/insitu/geom"
	"cleft/planes"
)

// ParseNumber reads a decimal number as people write them in tables and
// site files: an optional sign, digits with an optional decimal point, and
// an optional exponent,
//
//	[+-] (d+ [. d*] | . d+) [(e|E) [+-] d+]
//
// with spaces around it ignored. Hexadecimal (0x1p4), digit separators
// (1_000), Inf and NaN are not numbers here, and neither is a value too
// large for a float64 (1e400). ok is false for anything else.
func ParseNumber(s string) (v float64, ok bool) {
	s = strings.TrimSpace(s)
	if !isDecimal(s) {
		return 0, false
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, false
	}
	return v, true
}

// isDecimal reports whether s matches the grammar of ParseNumber.
func isDecimal(s string) bool {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	digits := 0
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i, digits = i+1, digits+1
	}
	if i < len(s) && s[i] == '.' {
		i++
		for i < len(s) && s[i] >= '0' && s[i] <= '9' {
			i, digits = i+1, digits+1
		}
	}
	if digits == 0 {
		return false
	}
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		i++
		if i < len(s) && (s[i] == '+' || s[i] == '-') {
			i++
		}
		exp := 0
		for i < len(s) && s[i] >= '0' && s[i] <= '9' {
			i, exp = i+1, exp+1
		}
		if exp == 0 {
			return false
		}
	}
	return i == len(s)
}

// ParseOrientation reads "DIP/DIPDIRECTION", e.g. "65/120", with decimal
// numbers only (see ParseNumber).
func ParseOrientation(s string) (planes.Orientation, error) {
	a, b, ok := strings.Cut(s, "/")
	dip, ok1 := ParseNumber(a)
	dd, ok2 := ParseNumber(b)
	if !ok || !ok1 || !ok2 {
		return planes.Orientation{}, fmt.Errorf("%s: want DIP/DIP_DIRECTION in degrees, e.g. 65/120", Quote(s))
	}
	return planes.New(dip, dd)
}

// ParseLine reads "TREND/PLUNGE", e.g. "120/10", with decimal numbers only.
func ParseLine(s string) (geom.Line, error) {
	a, b, ok := strings.Cut(s, "/")
	t, ok1 := ParseNumber(a)
	p, ok2 := ParseNumber(b)
	switch {
	case !ok || !ok1 || !ok2:
		return geom.Line{}, fmt.Errorf("%s: want TREND/PLUNGE in degrees, e.g. 120/10", Quote(s))
	case !(t >= 0 && t <= 360) || !(p >= 0 && p <= 90):
		return geom.Line{}, fmt.Errorf("%s: trend must be in [0, 360] and plunge in [0, 90]", Quote(s))
	}
	return geom.Line{Trend: geom.Azimuth(t), Plunge: p}, nil
}
