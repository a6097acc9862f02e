package table

import (
	"encoding/csv"
	"encoding/json"
	"math"
	"strings"
	"testing"
	"unicode/utf8"

	"cleft/planes"
	"cleft/planes/site"
)

func FuzzEscaping(f *testing.F) {
	for _, s := range []string{"", "plain", "a,b", `say "hi"`, "two\nlines", " lead", "tab\there", "ünï", "\x00\x1f", "\xff bad"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		// CSV: the field reads back as itself (encoding/csv drops \r before \n,
		// so compare with that normalisation).
		line := string(appendCSV(nil, s)) + ",x\n"
		rec, err := csv.NewReader(strings.NewReader(line)).Read()
		if strings.ContainsAny(s, "\r") || !utf8.ValidString(s) {
			return // CR handling and invalid UTF-8 are encoding/csv's own business
		}
		if err != nil || len(rec) != 2 || rec[0] != s {
			t.Fatalf("CSV %q → %q → %q, %v", s, line, rec, err)
		}
		// JSON: valid, and equal to s where s is valid UTF-8.
		var got string
		if err := json.Unmarshal(appendJSONString(nil, s), &got); err != nil || got != s {
			t.Fatalf("JSON %q → %q, %v", s, got, err)
		}
	})
}

func TestUndefinedValues(t *testing.T) {
	p := site.Plane{Name: "P", Orientation: planes.MustNew(90, 0), Depth: 10}
	nan := math.NaN()
	r := planes.Result{SlipTendency: nan, NormalisedSlip: nan, DilationTendency: nan, FactorOfSafety: nan, Rake: nan, SlipTrend: nan, Normal: math.Copysign(0, -1), State: planes.Opening}
	row := string(AppendRow(nil, CSV, &p, &r, nil, true))
	rec, err := csv.NewReader(strings.NewReader(row)).Read()
	if err != nil || len(rec) != len(Columns) {
		t.Fatalf("row %q: %v", row, err)
	}
	for _, i := range []int{8, 9, 10, 11, 13, 14, 15} {
		if rec[i] != "" {
			t.Errorf("column %s = %q, want empty", Columns[i], rec[i])
		}
	}
	if rec[5] != "0" {
		t.Errorf("−0 printed as %q, want 0", rec[5])
	}
	js := "[" + string(AppendRow(nil, JSON, &p, &r, nil, true)) + "]"
	var v []map[string]any
	if err := json.Unmarshal([]byte(js), &v); err != nil {
		t.Fatalf("JSON row %s: %v", js, err)
	}
	for _, i := range []int{8, 9, 10, 11, 13, 14, 15} {
		if x, ok := v[0][Columns[i]]; !ok || x != nil {
			t.Errorf("JSON %s = %v, want null", Columns[i], x)
		}
	}
}
