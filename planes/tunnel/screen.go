package tunnel

import (
	"fmt"
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
	// Zone is the region round the opening where the target is critical or
	// opening under the stress in the rock (Find on Tunnel.ZoneGrid, with
	// the pore-pressure rule of Screening.Section); empty with NoZones.
	Zone Zone
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
	// Opening is the opening in its far field (tunnel frame) with the
	// support pressure; Up, Right and Along are the tunnel frame's axes in
	// the NED frame (opening.TunnelFrame).
	Opening          opening.Circle
	Up, Right, Along r3.Vec
	// Influence is the radius of influence of the drained rule at this
	// station, m from the axis (NaN for a wall at the far-field pressure).
	Influence float64
	Rows      []Row // one per target
}

// Screening is the tunnel screened station by station.
type Screening struct {
	Tunnel   Tunnel
	Targets  []Target
	Stations []Result
}

// Screen screens every station of t (t.Stations) in the far field of m
// against every target: the far field at the axis depth, the wall stresses
// (with the support pressure t.Support) resolved on each target at the wall
// points, and, unless t.NoZones, each target's slip zone in the rock, found
// for all stations and targets in parallel (one worker per CPU). It is an
// error for the opening to be invalid (opening.NewCircle) or the drained
// rule's radius of influence not to lie beyond the radius.
func Screen(t Tunnel, m insitu.Model, targets []Target) (*Screening, error) {
	sts, err := t.Stations()
	if err != nil {
		return nil, err
	}
	sc := &Screening{Tunnel: t, Targets: targets}
	n := 360 / PerimeterStep
	walls := make([]insitu.State, n)
	for _, st := range sts {
		res := Result{Station: st, State: m.At(st.Depth), Influence: math.NaN()}
		res.Up, res.Right, res.Along = opening.TunnelFrame(geom.Line{Trend: st.Trend, Plunge: st.Plunge})
		far := res.State.Total.Rotate([3]r3.Vec{res.Up, res.Right, res.Along})
		if res.Opening, err = opening.NewCircle(far, t.Radius, t.Poisson, t.Support); err != nil {
			return nil, fmt.Errorf("station at chainage %g m: %w", st.Chainage, err)
		}
		if t.Drained {
			res.Influence = t.Influence
			if res.Influence == 0 {
				res.Influence = DefaultInfluence(res.State.PorePressure, t.Radius)
			}
			if !(res.Influence > t.Radius) {
				return nil, fmt.Errorf("radius of influence %v m: want more than the radius %v m", res.Influence, t.Radius)
			}
		} else {
			res.WallPp = res.State.PorePressure
		}
		for k := range n {
			th := float64(k * PerimeterStep)
			res.Wall = append(res.Wall, res.Opening.Wall(th))
			// At the wall σrr is the support pressure: the field at r = a.
			wt := res.Opening.At(t.Radius, th).Tensor(res.Up, res.Right, res.Along, th)
			walls[k] = insitu.NewState(wt, st.Depth, 0, res.State.Biot)
		}
		res.ThetaMax = opening.MaxTangential(far, t.Support)
		res.ThetaMin = opening.Peak{Stress: 2*(far.NN+far.EE-t.Support) - res.ThetaMax.Stress, Theta: math.Mod(res.ThetaMax.Theta+90, 180)}
		res.WallMax = opening.MaxWallPrincipal(far, t.Poisson, t.Support)
		res.Ratio = res.WallMax.Stress / t.UCS
		for _, tg := range targets {
			row := Row{Drive: ClassifyDrive(tg.Orientation, st.Trend)}
			s := res.State
			s.PorePressure = tg.porePressure(s.PorePressure)
			planes.ResolveTo(&row.Far, &s, &tg.Orientation, tg.Criterion)
			var r planes.Result
			wallPp := 0.0
			if !t.Drained {
				wallPp = s.PorePressure // the target's own, as in the zone
			}
			for k := range n {
				walls[k].PorePressure = wallPp
				planes.ResolveTo(&r, &walls[k], &tg.Orientation, tg.Criterion)
				row.Wall = append(row.Wall, r.State)
			}
			row.Critical = Arcs(row.Wall, planes.Critical)
			row.Opening = Arcs(row.Wall, planes.Opening)
			res.Rows = append(res.Rows, row)
		}
		sc.Stations = append(sc.Stations, res)
	}
	if !t.NoZones {
		sc.findZones()
	}
	return sc, nil
}

// porePressure is the target's pore pressure where the water model gives
// pp: pp, or max(0, pp + PoreExcess) when the target has its own.
func (tg *Target) porePressure(pp float64) float64 {
	if math.IsNaN(tg.PoreExcess) {
		return pp
	}
	return math.Max(0, pp+tg.PoreExcess)
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
