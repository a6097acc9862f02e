package main

import (
	"bufio"
	"fmt"
	"math"
	"math/rand/v2"
	"os"
)

// generatePlanes writes n planes with a deterministic spread of
// orientations and depths, a name and a set column.
func generatePlanes(path string, n int) error {
	return writeTable(path, func(w *bufio.Writer) {
		fmt.Fprintln(w, "name,dip,dip_direction,depth,set")
		for i := range n {
			fmt.Fprintf(w, "J%d,%d,%d,%d,S%d\n", i, (i*7)%91, (i*37)%360, 20+(i%50)*5, i%4)
		}
	})
}

// readingSets are the synthetic joint sets of generateReadings: mean pole
// (trend, plunge, degrees), Fisher concentration and share of the readings;
// the rest of the readings (10 %) are scattered uniformly.
var readingSets = []struct {
	trend, plunge, kappa, share float64
}{
	{320, 15, 40, 0.40}, // steep set dipping SE
	{70, 70, 60, 0.30},  // gently dipping set
	{190, 5, 30, 0.20},  // steep set straddling the primitive
}

// generateReadings writes n field readings (dip, dip direction, 0.1°) drawn
// from readingSets with a fixed seed: the same file for the same n.
func generateReadings(path string, n int) error {
	rng := rand.New(rand.NewPCG(17, uint64(n)))
	return writeTable(path, func(w *bufio.Writer) {
		fmt.Fprintln(w, "dip,dip_direction")
		for range n {
			x, y, z := uniformAxis(rng)
			u, s := rng.Float64(), 0.0
			for _, set := range readingSets {
				if s += set.share; u < s {
					x, y, z = fisherAxis(rng, set.trend, set.plunge, set.kappa)
					break
				}
			}
			if z < 0 {
				x, y, z = -x, -y, -z
			}
			// The pole (x north, y east, z down) of a plane dipping δ
			// towards α points at trend α + 180, plunge 90 − δ.
			dip := 90 - math.Asin(min(1, z))*180/math.Pi
			dd := math.Mod(math.Atan2(y, x)*180/math.Pi+180+360, 360)
			fmt.Fprintf(w, "%.1f,%.1f\n", dip, math.Mod(math.Round(dd*10)/10, 360))
		}
	})
}

// uniformAxis is a direction uniform on the sphere.
func uniformAxis(rng *rand.Rand) (x, y, z float64) {
	for {
		x, y, z = rng.NormFloat64(), rng.NormFloat64(), rng.NormFloat64()
		if r := math.Sqrt(x*x + y*y + z*z); r > 1e-9 {
			return x / r, y / r, z / r
		}
	}
}

// fisherAxis draws a direction from the Fisher distribution of
// concentration kappa about the line trend/plunge (degrees), by the
// simulation method of Fisher, Lewis & Embleton (1987), §3.6.2.
func fisherAxis(rng *rand.Rand, trend, plunge, kappa float64) (x, y, z float64) {
	u := rng.Float64()
	c := 1 + math.Log(u+(1-u)*math.Exp(-2*kappa))/kappa
	s := math.Sqrt(max(0, 1-c*c))
	phi := 2 * math.Pi * rng.Float64()
	// Rotate (s cos φ, s sin φ, c) about the pole z to the mean line.
	st, ct := math.Sincos(trend * math.Pi / 180)
	sp, cp := math.Sincos(plunge * math.Pi / 180)
	mx, my, mz := cp*ct, cp*st, sp  // the mean
	ax, ay, az := sp*ct, sp*st, -cp // down the plunge, normal to the mean
	bx, by := -st, ct               // horizontal, normal to both
	a, b := s*math.Cos(phi), s*math.Sin(phi)
	return c*mx + a*ax + b*bx, c*my + a*ay + b*by, c*mz + a*az
}

func writeTable(path string, fill func(*bufio.Writer)) error {
	f, err := os.Create(path)
	if err != nil {
		return err
	}
	w := bufio.NewWriterSize(f, 1<<20)
	fill(w)
	if err := w.Flush(); err != nil {
		f.Close()
		return err
	}
	return f.Close()
}
