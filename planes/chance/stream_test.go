package chance

import (
	"fmt"
	"math"
	"math/rand/v2"
	"runtime"
	"sync"
	"testing"
)

func TestStreamIndependentOfWorkers(t *testing.T) {
	// The draws of realisation i depend on (seed, i) only: serially, with
	// workers in an interleaved order, and by reseeding one generator.
	const n, m = 1000, 4
	serial := make([][m]uint64, n)
	for i := range serial {
		r := Stream(11, i)
		for j := range m {
			serial[i][j] = r.Uint64()
		}
	}
	for _, procs := range []int{1, 2, 4} {
		t.Run(fmt.Sprintf("GOMAXPROCS=%d", procs), func(t *testing.T) {
			defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
			par := make([][m]uint64, n)
			var wg sync.WaitGroup
			for w := range procs {
				wg.Go(func() {
					for i := n - 1 - w; i >= 0; i -= procs {
						r := Stream(11, i)
						for j := range m {
							par[i][j] = r.Uint64()
						}
					}
				})
			}
			wg.Wait()
			if !equalRows(par, serial) {
				t.Errorf("GOMAXPROCS %d: streams differ from the serial run", procs)
			}
		})
	}
	t.Run("reseeded", func(t *testing.T) {
		src := rand.NewChaCha8([32]byte{})
		for i := range serial {
			src.Seed(StreamKey(11, i))
			for j := range m {
				if src.Uint64() != serial[i][j] {
					t.Fatalf("realisation %d: reseeded generator differs", i)
				}
			}
		}
	})
}

func equalRows(a, b [][4]uint64) bool {
	for i := range a {
		if a[i] != b[i] {
			return false
		}
	}
	return true
}

func TestStreamsDistinct(t *testing.T) {
	first := func(k [32]byte) uint64 { return rand.NewChaCha8(k).Uint64() }
	seen := map[uint64]string{}
	for _, c := range []struct {
		name string
		k    [32]byte
	}{
		{"seed 1 realisation 0", StreamKey(1, 0)},
		{"seed 1 realisation 1", StreamKey(1, 1)},
		{"seed 2 realisation 0", StreamKey(2, 0)},
		{"seed 1 input 0", key(1, purposeInput, 0)},
		{"seed 1 scores 0", key(1, purposeScores, 0)},
		{"seed 1 item 0", key(1, purposeItem, 0)},
	} {
		v := first(c.k)
		if s, ok := seen[v]; ok {
			t.Errorf("%s repeats %s", c.name, s)
		}
		seen[v] = c.name
	}
	wantPanic(t, func() { StreamKey(1, -1) })
	wantPanic(t, func() { ItemStream(1, -1) })
	if a, b := ItemStream(1, 0).Uint64(), rand.NewChaCha8(key(1, purposeItem, 0)).Uint64(); a != b {
		t.Errorf("ItemStream(1, 0) starts %d, want the stream keyed (1, item, 0): %d", a, b)
	}
}

func TestNeighbouringStreamsUncorrelated(t *testing.T) {
	// The first uniform of realisations 0…n−1 must look like an independent
	// sample: mean 1/2 and variance 1/12 (uniform distribution; common
	// practice), lag-1 correlation 0, each within 5 standard errors
	// (SE of the mean √(1/12n); of a correlation ≈ 1/√n).
	const n = 20000
	u := make([]float64, n)
	for i := range u {
		u[i] = openUniform(Stream(3, i))
	}
	mean, lag := 0.0, 0.0
	for i, v := range u {
		mean += v
		if i > 0 {
			lag += (v - 0.5) * (u[i-1] - 0.5)
		}
	}
	mean /= n
	lag /= (n - 1) / 12.0
	if se := math.Sqrt(1.0 / 12 / n); math.Abs(mean-0.5) > 5*se {
		t.Errorf("mean %v, want 0.5 ± %v", mean, 5*se)
	}
	if se := 1 / math.Sqrt(n); math.Abs(lag) > 5*se {
		t.Errorf("lag-1 correlation %v, want 0 ± %v", lag, 5*se)
	}
}
