package chance_test

import (
	"fmt"
	"math"
	"slices"

	"cleft/planes/chance"

	"gonum.org/v1/gonum/mat"
	"gonum.org/v1/gonum/spatial/r3"
)

// One cohesionless plane with slip tendency 0.6 and an uncertain friction
// coefficient, uniform on [0.5, 0.8], correlated with an uncertain SHmax
// ratio (which this sketch does not use further). The plane is critical
// when μ ≤ Ts; its factor of safety is μ/Ts. The closed forms are
// P(critical) = 1/3 and FS percentiles 0.858, 1.083, 1.308 (derived): the
// draw of 10000 lies within two standard errors of each.
func Example() {
	friction, _ := chance.NewUniform(0.5, 0.8)
	ratio, _ := chance.NewNormal(1.3, 0.1)
	ratio, _ = ratio.Truncate(1, math.Inf(1))
	const n, ts = 10000, 0.6
	x, err := chance.Draw([]chance.Dist{friction, ratio}, []chance.Pair{{A: 0, B: 1, Rho: -0.4}}, n, 1)
	if err != nil {
		fmt.Println(err)
		return
	}
	mu := mat.Col(nil, 0, x)
	fs := make([]float64, n)
	hits := 0
	for i, m := range mu {
		fs[i] = m / ts
		if m <= ts {
			hits++
		}
	}
	p := float64(hits) / n
	pct := chance.Percentiles(nil, fs, []float64{0.05, 0.5, 0.95})
	fmt.Printf("P(critical) = %.3f ± %.3f\n", p, chance.StdErr(p, n))
	fmt.Printf("FS 5 %%, 50 %%, 95 %%: %.3f %.3f %.3f\n", pct[0], pct[1], pct[2])
	fmt.Printf("rank correlation of friction and ratio: %.2f\n", chance.Spearman(mu, mat.Col(nil, 1, x)))
	// Output:
	// P(critical) = 0.326 ± 0.005
	// FS 5 %, 50 %, 95 %: 0.858 1.087 1.307
	// rank correlation of friction and ratio: -0.40
}

// A normal truncated to [mean, ∞) is the half-normal: its mean lies
// sd·√(2/π) ≈ 0.798·sd above.
func ExampleDist_Truncate() {
	d, _ := chance.NewNormal(10, 2)
	d, _ = d.Truncate(10, math.Inf(1))
	fmt.Printf("mean %.4f, median %.4f\n", d.Mean(), d.Quantile(0.5))
	// Output:
	// mean 11.5958, median 11.3490
}

// Each realisation draws the pole of a plane from a Fisher distribution
// about its mapped pole, from its own stream, so that the result does not
// depend on which worker runs it. For κ = 50 half the poles lie within
// acos(1 − ln 2/κ) = 9.5° of the mean (derived from the Fisher CDF).
func ExampleFisher() {
	pole := r3.Vec{X: 0.5, Y: 0.5, Z: math.Sqrt(0.5)}
	f := chance.NewFisher(pole, 50)
	angles := make([]float64, 2000)
	for i := range angles {
		v := f.Draw(chance.Stream(1, i))
		angles[i] = math.Acos(math.Min(1, r3.Dot(v, pole))) * 180 / math.Pi
	}
	slices.Sort(angles)
	fmt.Printf("median angle from the mapped pole: %.1f° (theory 9.5°)\n", chance.Percentile(angles, 0.5))
	// Output:
	// median angle from the mapped pole: 9.7° (theory 9.5°)
}
