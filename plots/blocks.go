package plots

import (
	"math"

	"gonum.org/v1/plot/vg"
)

// blockDisk marks the disk of radius r round o as taken, as horizontal
// strips no thicker than step whose ends reach the circle: names then stay
// off the disk (a ring chart, a section's rock).
//
// The strips cover the disk: strip k spans y from o.Y + y0 to o.Y + y1 and
// is as wide as the disk at the y of the two nearer to the centre.
func (p *labeller) blockDisk(o vg.Point, r, step vg.Length) {
	if r <= 0 {
		return
	}
	n := max(1, int(math.Ceil(float64(2*r/step))))
	for k := range n {
		y0 := -r + 2*r*vg.Length(k)/vg.Length(n)
		y1 := -r + 2*r*vg.Length(k+1)/vg.Length(n)
		y := min(abs(y0), abs(y1))
		if y0 < 0 && y1 > 0 {
			y = 0
		}
		half := vg.Length(math.Sqrt(math.Max(0, float64(r*r-y*y))))
		p.block(vg.Rectangle{Min: vg.Point{X: o.X - half, Y: o.Y + y0}, Max: vg.Point{X: o.X + half, Y: o.Y + y1}})
	}
}

func abs(v vg.Length) vg.Length {
	if v < 0 {
		return -v
	}
	return v
}
