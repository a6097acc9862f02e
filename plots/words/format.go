package words

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Fixed formats v with d decimals, "—" when undefined (NaN or ±Inf).
func Fixed(v float64, d int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	return strconv.FormatFloat(v+0, 'f', d, 64)
}

// Num formats v with up to 4 significant digits, "—" when undefined.
func Num(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	return fmt.Sprintf("%.4g", v+0)
}

// Signed formats v to two decimals with a true minus sign.
func Signed(v float64) string {
	return strings.Replace(fmt.Sprintf("%.2f", v+0), "-", "−", 1)
}

// Angle formats an angle as a zero-padded whole number of width w, "—"
// when undefined.
func Angle(v float64, w int) string {
	if math.IsNaN(v) {
		return "—"
	}
	return fmt.Sprintf("%0*.0f", w, v)
}

// Rake rounds a rake to whole degrees in (−180, 180]: −179.7 shows as 180.
func Rake(v float64) string {
	if math.IsNaN(v) {
		return "—"
	}
	r := math.Round(v)
	if r == -180 {
		r = 180
	}
	return fmt.Sprintf("%.0f", r+0)
}

// Trend rounds an azimuth to a whole three-digit number of degrees in
// [0, 360): 359.7 shows as 000; "—" when undefined.
func Trend(v float64) string {
	if math.IsNaN(v) {
		return "—"
	}
	r := math.Round(v)
	if r >= 360 {
		r -= 360
	}
	return fmt.Sprintf("%03.0f", r+0)
}

// Plural is "1 one" or "n many".
func Plural(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}

func isAre(n int) string {
	if n == 1 {
		return "1 is"
	}
	return fmt.Sprintf("%d are", n)
}

// Depths joins depths as "50, 120 and 200".
func Depths(ds []float64) string {
	s := make([]string, len(ds))
	for i, d := range ds {
		s[i] = fmt.Sprintf("%g", d)
	}
	if len(s) > 1 {
		return strings.Join(s[:len(s)-1], ", ") + " and " + s[len(s)-1]
	}
	return strings.Join(s, "")
}

// Wrap breaks text into lines of at most width runes, at spaces.
func Wrap(text string, width int) string {
	var b strings.Builder
	n := 0
	for i, w := range strings.Fields(text) {
		l := len([]rune(w))
		if i > 0 && n+1+l > width {
			b.WriteString("\n")
			n = 0
		} else if i > 0 {
			b.WriteString(" ")
			n++
		}
		b.WriteString(w)
		n += l
	}
	return b.String()
}
