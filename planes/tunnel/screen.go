package tunnel

import (
	"math"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// PerimeterStep is the spacing of the wall points, degrees.
const PerimeterStep = 10

// Target is a plane or set screened along the tunnel, with its own
// strength. PoreExcess is the excess of its own pore pressure over the water
// model at its own depth, kept at every depth (MPa; NaN when the plane gives
// none): Pp(z) = max(0, model Pp(z) + PoreExcess).
type Target struct {
	Name        string
	Orientation planes.Orientation
	Criterion   planes.Criterion
	PoreExcess  float64
}

// Row is one target at one station.
type Row struct {
	Far               planes.Result       // in the far field at the axis depth
	Drive             DriveClass          // against the drive of the station's leg
	Wall              []planes.PlaneState // at each wall point, every PerimeterStep from the crown
	Critical, Opening []Arc               // runs of wall points in those states
}

// Result is the screening at one station.
type Result struct {
	Station
	State insitu.State         // the far field at the axis depth
	Wall  []opening.WallStress // at 0, PerimeterStep, … degrees
	// ThetaMax and ThetaMin are the exact extremes of σθ round the wall
	// (closed form, opening.MaxTangential; the least is 180° − … away by
	// symmetry); WallMax is the largest principal stress in the plane of the
	// wall, σθ with σz and τθz (opening.MaxWallPrincipal), found by root
	// search. Angles in [0, 180): the same values recur 180° on.
	ThetaMax, ThetaMin, WallMax opening.Peak
	// Ratio is WallMax / UCS: spalling is judged on the largest boundary
	// stress (Martin, Kaiser & McCreath 1999 used the largest boundary
	// stress; in their plane cases it is σθ,max, as τθz = 0).
	Ratio  float64
	WallPp float64 // pore pressure at the wall, MPa
	Rows   []Row   // one per target
}

// Screening is the tunnel screened station by station.
type Screening struct {
	Tunnel   Tunnel
	Targets  []Target
	Stations []Result
}

// Screen screens every station of t (t.Stations) in the far field of m
// against every target.
func Screen(t Tunnel, m insitu.Model, targets []Target) (*Screening, error) {
	sts, err := t.Stations()
	if err != nil {
		return nil, err
	}
	sc := &Screening{Tunnel: t, Targets: targets}
	n := 360 / PerimeterStep
	walls := make([]insitu.State, n)
	for _, st := range sts {
		res := Result{Station: st, State: m.At(st.Depth)}
		up, right, along := opening.TunnelFrame(geom.Line{Trend: st.Trend, Plunge: st.Plunge})
		far := res.State.Total.Rotate([3]r3.Vec{up, right, along})
		if !t.Drained {
			res.WallPp = res.State.PorePressure
		}
		for k := range n {
			th := float64(k * PerimeterStep)
			w := opening.Wall(far, th, t.Poisson)
			res.Wall = append(res.Wall, w)
			walls[k] = insitu.NewState(w.WallTensor(up, right, along, th), st.Depth, res.WallPp, res.State.Biot)
		}
		res.ThetaMax = opening.MaxTangential(far, 0)
		res.ThetaMin = opening.Peak{Stress: 2*(far.NN+far.EE) - res.ThetaMax.Stress, Theta: math.Mod(res.ThetaMax.Theta+90, 180)}
		res.WallMax = opening.MaxWallPrincipal(far, t.Poisson, 0)
		res.Ratio = res.WallMax.Stress / t.UCS
		for _, tg := range targets {
			row := Row{Drive: ClassifyDrive(tg.Orientation, st.Trend)}
			s := res.State
			if !math.IsNaN(tg.PoreExcess) {
				s.PorePressure = math.Max(0, s.PorePressure+tg.PoreExcess)
			}
			planes.ResolveTo(&row.Far, &s, &tg.Orientation, tg.Criterion)
			var r planes.Result
			for k := range n {
				planes.ResolveTo(&r, &walls[k], &tg.Orientation, tg.Criterion)
				row.Wall = append(row.Wall, r.State)
			}
			row.Critical = Arcs(row.Wall, planes.Critical)
			row.Opening = Arcs(row.Wall, planes.Opening)
			res.Rows = append(res.Rows, row)
		}
		sc.Stations = append(sc.Stations, res)
	}
	return sc, nil
}

// Worst returns the index of the station with the largest Ratio.
func (sc *Screening) Worst() int {
	w := 0
	for i, st := range sc.Stations {
		if st.Ratio > sc.Stations[w].Ratio {
			w = i
		}
	}
	return w
}

// StationAt returns the index of the station at chainage ch (to 1e-6 m), or −1.
func (sc *Screening) StationAt(ch float64) int {
	for i, st := range sc.Stations {
		if math.Abs(st.Chainage-ch) < 1e-6 {
			return i
		}
	}
	return -1
}

// Stretch is a run of consecutive stations sharing a condition, by
// chainage (From = To for a single station).
type Stretch struct{ From, To float64 }

// Stretches returns the runs of consecutive stations for which cond holds.
func (sc *Screening) Stretches(cond func(*Result) bool) []Stretch {
	var out []Stretch
	for i := range sc.Stations {
		st := &sc.Stations[i]
		if !cond(st) {
			continue
		}
		if len(out) > 0 && i > 0 && cond(&sc.Stations[i-1]) {
			out[len(out)-1].To = st.Chainage
			continue
		}
		out = append(out, Stretch{st.Chainage, st.Chainage})
	}
	return out
}
