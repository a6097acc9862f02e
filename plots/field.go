package plots

import (
	"math"
	"runtime"
	"sync"

	"cleft/insitu"
	"cleft/planes"
)

// Field is a measure evaluated for every plane orientation at one state:
// every pole position on the net, on an N × N grid over [−1, 1]². Node (i, j)
// sits at x = −1 + 2i/(N−1), y = 1 − 2j/(N−1) (row 0 at the top, north), and
// is the pole of the plane whose value it holds. Nodes outside the primitive
// take the value of the primitive point on the same radius, so that contours
// run to the primitive; Inside tells them apart.
type Field struct {
	N       int
	Measure Measure
	Values  []float64 // the measure, row-major
	Safety  []float64 // the factor of safety, for the FS = 1 line
	Min     float64   // over the nodes inside the primitive, NaNs left out
	Max     float64
}

// NewField evaluates m on an n × n grid (n ≥ 2) with planes.Resolve, the
// same call the tables use, in parallel over rows.
func NewField(s insitu.State, c planes.Criterion, m Measure, p Projection, n int) *Field {
	if n < 2 {
		panic("plots: field grid needs n ≥ 2")
	}
	f := &Field{N: n, Measure: m, Values: make([]float64, n*n), Safety: make([]float64, n*n)}
	workers := runtime.GOMAXPROCS(0)
	var wg sync.WaitGroup
	rows := make(chan int, n)
	for j := range n {
		rows <- j
	}
	close(rows)
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			var r planes.Result
			for j := range rows {
				for i := range n {
					o := f.orientation(p, i, j)
					planes.ResolveTo(&r, &s, &o, c)
					f.Values[j*n+i] = m.Value(&r)
					f.Safety[j*n+i] = r.FactorOfSafety
				}
			}
		}()
	}
	wg.Wait()
	f.Min, f.Max = math.Inf(1), math.Inf(-1)
	for j := range n {
		for i := range n {
			if v := f.Values[j*n+i]; f.Inside(i, j) && !math.IsNaN(v) {
				f.Min, f.Max = math.Min(f.Min, v), math.Max(f.Max, v)
			}
		}
	}
	return f
}

// Node returns the net position of node (i, j).
func (f *Field) Node(i, j int) Point {
	d := 2 / float64(f.N-1)
	return Point{X: -1 + float64(i)*d, Y: 1 - float64(j)*d}
}

// Inside reports whether node (i, j) lies within the primitive.
func (f *Field) Inside(i, j int) bool {
	pt := f.Node(i, j)
	return pt.X*pt.X+pt.Y*pt.Y <= 1
}

// Orientation returns the plane whose pole is at node (i, j) (clamped to
// the primitive outside it).
func (f *Field) orientation(p Projection, i, j int) planes.Orientation {
	pt := f.Node(i, j)
	if r := math.Hypot(pt.X, pt.Y); r > 1 {
		pt.X, pt.Y = pt.X/r, pt.Y/r
	}
	l, _ := p.Inverse(pt)
	o, err := planes.FromPole(l.Trend, math.Max(0, math.Min(90, l.Plunge)))
	if err != nil {
		panic("plots: " + err.Error())
	}
	return o
}
