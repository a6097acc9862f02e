package table

import (
	"encoding/csv"
	"io"
)

// Cell formats a number for a table: 8 significant digits, empty when
// undefined (NaN or ±Inf), 0 for −0.
func Cell(v float64) string { return string(appendNumber(nil, v)) }

// WriteCSV writes rows, the first the header, as CSV (RFC 4180).
func WriteCSV(w io.Writer, rows [][]string) error {
	cw := csv.NewWriter(w)
	if err := cw.WriteAll(rows); err != nil {
		return err
	}
	return cw.Error()
}
