package site

import (
	"errors"
	"fmt"
	"io"
	"strings"
	"testing"
)

// BenchmarkPlaneReader reads a table of 100,000 planes with a carried
// column, as cleft resolve does: the CSV guard, the checks of names and
// carried text, decimal numbers and the repeat check of names included.
func BenchmarkPlaneReader(b *testing.B) {
	var sb strings.Builder
	sb.WriteString("name,dip,dip_direction,depth,note\n")
	const rows = 100000
	for i := range rows {
		fmt.Fprintf(&sb, "P%d,%d.5,%d.25,%d,wet joint %d\n", i, i%90, (i*37)%360, 20+(i*13)%400, i%7)
	}
	data := sb.String()
	s, err := Parse([]byte("site: b\ndepth: 50\nstress:\n  vertical: {gradient: 0.027}\n  shmax: {ratio: 1.2, azimuth: 90}\n  shmin: {ratio: 0.7}\n"), "b.yaml")
	if err != nil {
		b.Fatal(err)
	}
	b.SetBytes(int64(len(data)))
	b.ReportAllocs()
	for b.Loop() {
		ps, err := s.OpenPlanes("-", strings.NewReader(data))
		if err != nil {
			b.Fatal(err)
		}
		var p Plane
		n := 0
		for {
			if err := ps.Next(&p); err != nil {
				if !errors.Is(err, io.EOF) {
					b.Fatal(err)
				}
				break
			}
			n++
		}
		if n != rows {
			b.Fatalf("%d rows", n)
		}
	}
}
