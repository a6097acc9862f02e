package planes

import (
	"math/rand/v2"
	"testing"

	"cleft/insitu"
)

// verdictTensor returns a tensor with normal components in [−5, 45] MPa and
// shears in ±15 MPa: mostly compressive, sometimes with tension.
func verdictTensor(rng *rand.Rand) insitu.Tensor {
	return insitu.Tensor{NN: rng.Float64()*50 - 5, EE: rng.Float64()*50 - 5, DD: rng.Float64()*50 - 5,
		NE: rng.Float64()*30 - 15, ND: rng.Float64()*30 - 15, ED: rng.Float64()*30 - 15}
}

func TestStateOfAgreesWithResolveTo(t *testing.T) {
	// StateOf is a short cut of ResolveTo: its verdict must be ResolveTo's
	// State for every state, plane and criterion, including states whose
	// Principal is not their Total's (as a search that swaps in local
	// tensors uses), states without shear and opening planes. The cases must
	// reach all three verdicts often, or the agreement would prove little.
	rng := rand.New(rand.NewPCG(131, 132))
	bb, err := NewBartonBandis(8, 60, 28)
	if err != nil {
		t.Fatal(err)
	}
	crits := []Criterion{&Coulomb{Mu: 0.6}, &Coulomb{Mu: 0.3, Cohesion: 2}, &Coulomb{Mu: 0.9}, bb}
	for _, c := range []struct {
		name  string
		state func() insitu.State
	}{
		{"fresh", func() insitu.State {
			return insitu.NewState(verdictTensor(rng), 100, rng.Float64()*20, 0.5+rng.Float64()/2)
		}},
		{"swapped tensor", func() insitu.State {
			s := insitu.NewState(verdictTensor(rng), 100, rng.Float64()*20, 1)
			s.Total = verdictTensor(rng)
			return s
		}},
		{"isotropic", func() insitu.State {
			p := rng.Float64() * 30
			return insitu.NewState(insitu.Tensor{NN: p, EE: p, DD: p}, 100, rng.Float64()*40, 1)
		}},
	} {
		t.Run(c.name, func(t *testing.T) {
			var count [3]int
			var r Result
			for range 20000 {
				s := c.state()
				o := MustNew(rng.Float64()*90, rng.Float64()*360)
				k := crits[rng.IntN(len(crits))]
				ResolveTo(&r, &s, &o, k)
				if got := StateOf(&s, &o, k); got != r.State {
					t.Fatalf("%+v, plane %v, %v: StateOf %v, ResolveTo %v (FS %v, σn' %v)", s, o, k, got, r.State, r.FactorOfSafety, r.EffectiveNormal)
				}
				count[r.State]++
			}
			if c.name != "isotropic" && (count[Stable] < 1000 || count[Critical] < 1000 || count[Opening] < 1000) {
				t.Errorf("verdicts stable/critical/opening %v: the cases do not reach each often", count)
			}
			if c.name == "isotropic" && count[Critical] != 0 {
				t.Errorf("an isotropic state without shear gave %d critical planes", count[Critical])
			}
		})
	}
}

var sinkState PlaneState

// BenchmarkStateOf is the verdict alone on a fixed state, to set against
// BenchmarkResolveTo.
func BenchmarkStateOf(b *testing.B) {
	s := insitu.NewState(insitu.Andersonian(30, 15, 20, 65), 150, 1.4, 1)
	os := make([]Orientation, 1024)
	for i := range os {
		os[i] = MustNew(float64(i%91), float64((i*37)%360))
	}
	var c Criterion = &Coulomb{Mu: 0.6}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		sinkState = StateOf(&s, &os[i&1023], c)
	}
}
