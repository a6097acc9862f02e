package chance

import (
	"math/rand/v2"
	"slices"
)

func sortFloats(x []float64) { slices.Sort(x) }

func newReseeder() *rand.ChaCha8 { return rand.NewChaCha8([32]byte{}) }
