package table

import (
	"bytes"
	"testing"

	"cleft/planes/assess"
	"cleft/planes/sets"
	"cleft/planes/site"
	"cleft/planes/site/demo"
)

// TestWriteReadings checks that readings.csv streamed row by row is the
// table Readings builds, written by WriteCSV, to the byte: the demo's
// readings, with a carried-through column, an unassigned reading and
// Terzaghi weights.
func TestWriteReadings(t *testing.T) {
	f, err := demo.FS.Open("readings.csv")
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	readings, extras, _, err := site.ReadReadings(f, "readings.csv", 0, false)
	if err != nil {
		t.Fatal(err)
	}
	l, err := site.ParseLine("100/70")
	if err != nil {
		t.Fatal(err)
	}
	g := assess.Group(readings, sets.Config{MaxAngle: 30, Line: &l, MaxWeight: sets.DefaultMaxWeight})
	if g.Analysis.Unassigned == 0 || len(extras) == 0 {
		t.Fatalf("%d unassigned, extras %v: the case should have both", g.Analysis.Unassigned, extras)
	}
	var want, got bytes.Buffer
	if err := WriteCSV(&want, Readings(g, readings, extras)); err != nil {
		t.Fatal(err)
	}
	if err := WriteReadings(&got, g, readings, extras); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(got.Bytes(), want.Bytes()) {
		t.Errorf("streamed readings.csv differs:\n%s\nwant\n%s", got.Bytes(), want.Bytes())
	}
}
