// Package table writes the plane results table of cleft as CSV or JSON,
// one row per plane, in a fixed column order, streaming. An undefined value
// is an empty CSV cell and a JSON null, never 0, NaN or Inf. Numbers carry 8
// significant digits.
package table

import (
	"fmt"
	"math"
	"unicode/utf8"

	"cleft/planes"
	"cleft/planes/site"
)

// Columns are the result columns, in order; extra input columns follow them.
var Columns = []string{
	"name", "dip", "dip_direction", "depth_m", "pore_pressure_mpa",
	"normal_stress_mpa", "shear_stress_mpa", "effective_normal_stress_mpa",
	"slip_tendency", "slip_tendency_normalised", "dilation_tendency",
	"factor_of_safety", "pressure_to_slip_mpa", "rake_deg", "slip_trend_deg", "slip_sense", "state",
}

// Format is CSV or JSON.
type Format int

const (
	CSV Format = iota
	JSON
)

// ParseFormat reads "csv" or "json".
func ParseFormat(s string) (Format, error) {
	switch s {
	case "csv":
		return CSV, nil
	case "json":
		return JSON, nil
	}
	return 0, fmt.Errorf("--format %q: want csv or json", s)
}

// Header returns what precedes the first row: the CSV header line, or the
// opening bracket of the JSON array.
func Header(f Format, extras []string) []byte {
	if f == JSON {
		return []byte("[")
	}
	var b []byte
	for i, c := range Columns {
		if i > 0 {
			b = append(b, ',')
		}
		b = appendCSV(b, c)
	}
	for _, c := range extras {
		b = append(b, ',')
		b = appendCSV(b, c)
	}
	return append(b, '\n')
}

// Footer returns what follows the last row: nothing for CSV, the closing
// bracket for JSON. rows is the number of rows written.
func Footer(f Format, rows int) []byte {
	if f == JSON {
		if rows == 0 {
			return []byte("]\n")
		}
		return []byte("\n]\n")
	}
	return nil
}

// AppendRow appends one row. first is true for the first row of the table
// (JSON needs no comma before it). It does not allocate beyond growing b.
func AppendRow(b []byte, f Format, p *site.Plane, r *planes.Result, extras []string, first bool) []byte {
	if f == JSON {
		if !first {
			b = append(b, ',')
		}
		b = append(b, "\n{"...)
	}
	o := p.Orientation
	nums := [...]float64{o.Dip(), o.DipDirection(), p.Depth, r.PorePressure,
		r.Normal, r.Shear, r.EffectiveNormal,
		r.SlipTendency, r.NormalisedSlip, r.DilationTendency,
		r.FactorOfSafety, r.PressureToSlip, r.Rake, r.SlipTrend}
	b = field(b, f, 0, p.Name)
	for i, v := range nums {
		b = sep(b, f, i+1)
		if f == JSON {
			b = appendJSONNumber(b, v)
		} else {
			b = appendNumber(b, v)
		}
	}
	b = sep(b, f, 15)
	b = value(b, f, r.Sense.String(), r.Sense == planes.NoSlip)
	b = sep(b, f, 16)
	b = value(b, f, r.State.String(), false)
	for i, e := range p.Extras {
		if f == JSON {
			b = append(b, ',')
			b = appendJSONString(b, extras[i])
			b = append(b, ':')
			b = appendJSONString(b, e)
		} else {
			b = append(b, ',')
			b = appendCSV(b, e)
		}
	}
	if f == JSON {
		return append(b, '}')
	}
	return append(b, '\n')
}

func field(b []byte, f Format, col int, s string) []byte {
	b = sep(b, f, col)
	return value(b, f, s, false)
}

// sep writes the separator before column col and, for JSON, its key.
func sep(b []byte, f Format, col int) []byte {
	if f == JSON {
		if col > 0 {
			b = append(b, ',')
		}
		b = append(b, '"')
		b = append(b, Columns[col]...)
		return append(b, '"', ':')
	}
	if col > 0 {
		b = append(b, ',')
	}
	return b
}

// value writes a text value; null marks it undefined (empty cell, JSON null).
func value(b []byte, f Format, s string, null bool) []byte {
	if f == JSON {
		if null {
			return append(b, "null"...)
		}
		return appendJSONString(b, s)
	}
	return appendCSV(b, s)
}

// AppendNumber appends v as the tables write numbers: 8 significant
// digits, nothing for NaN or ±Inf, 0 for −0.
func AppendNumber(b []byte, v float64) []byte { return appendNumber(b, v) }

func appendNumber(b []byte, v float64) []byte {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return b
	}
	return AppendSig8(b, v+0) // +0 turns −0 into 0
}

func appendJSONNumber(b []byte, v float64) []byte {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return append(b, "null"...)
	}
	return AppendSig8(b, v+0)
}

// appendCSV writes s as a CSV field, quoted when it must be (RFC 4180).
func appendCSV(b []byte, s string) []byte {
	quote := false
	for i := 0; i < len(s); i++ {
		switch s[i] {
		case ',', '"', '\n', '\r':
			quote = true
		}
	}
	if len(s) > 0 && (s[0] == ' ' || s[0] == '\t') {
		quote = true
	}
	if !quote {
		return append(b, s...)
	}
	b = append(b, '"')
	for i := 0; i < len(s); i++ {
		if s[i] == '"' {
			b = append(b, '"')
		}
		b = append(b, s[i])
	}
	return append(b, '"')
}

const hexDigits = "0123456789abcdef"

// appendJSONString writes s as a JSON string; invalid UTF-8 becomes U+FFFD.
func appendJSONString(b []byte, s string) []byte {
	b = append(b, '"')
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			switch {
			case c == '"' || c == '\\':
				b = append(b, '\\', c)
			case c < 0x20:
				b = append(b, '\\', 'u', '0', '0', hexDigits[c>>4], hexDigits[c&0xf])
			default:
				b = append(b, c)
			}
			i++
			continue
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		if r == utf8.RuneError && size == 1 {
			b = append(b, "\\ufffd"...)
		} else {
			b = append(b, s[i:i+size]...)
		}
		i += size
	}
	return append(b, '"')
}
