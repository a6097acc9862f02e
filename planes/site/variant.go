package site

import (
	"fmt"
	"math"
	"strconv"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// Variant is a copy of a site's model whose numbers are changed key by key
// with Set, without reading the site file again: a bracketing case, or one
// realisation of the Monte Carlo. Values that the site file left to a
// default which follows another key follow it here too (slope.friction_angle
// from the site friction, slope.unit_weight from the vertical stress
// gradient, slope.toppling_limit from the lateral limit, the slope's
// cohesion from the site's Coulomb cohesion, Sv's gradient from its
// density, the water model inside the stress model).
//
// Use: Reset (or a new Variant), Set each key, Finish, then read Model,
// Criterion, Slope and Tunnel. A Variant is not safe for concurrent use;
// what its getters return points into it.
type Variant struct {
	site *Site
	base *Variant // the site's own values, for Reset; nil in the base itself

	grad         insitu.GradientModel
	isGrad       bool
	density      float64 // kg/m³ when Sv is given by density, else 0
	shminFollows bool    // Sheorey on shmax alone: Shmin = SHmax

	meas      insitu.MeasuredModel
	byTensor  bool
	tensor    [6]float64
	mags      [3]float64
	axes      [3]geom.Line
	measDirty bool

	water   insitu.Water
	coulomb planes.Coulomb
	barton  planes.BartonBandis
	isCoul  bool

	slope                             slope.Slope
	hasSlope                          bool
	phiGiven, gammaGiven, toppleGiven bool
	hasTunnel                         bool
	tunnel                            tunnel.Tunnel
}

// Variant returns a copy of the site's model to change. It is safe to call
// from several goroutines.
func (s *Site) Variant() *Variant {
	v := *s.base
	v.base = s.base
	return &v
}

func (s *Site) newBase() *Variant {
	v := &Variant{site: s, water: s.Water}
	given := func(ps ...string) bool { _, ok := lookup(s.root, ps); return ok }
	num := func(ps ...string) float64 {
		n, _ := lookup(s.root, ps)
		x, _ := strconv.ParseFloat(n.n.Value, 64)
		return x
	}
	switch m := s.Model.(type) {
	case *insitu.GradientModel:
		v.grad, v.isGrad = *m, true
		if given("stress", "vertical", "density") {
			v.density = num("stress", "vertical", "density")
		}
		v.shminFollows = m.SHmax.Kind == insitu.Sheorey && !given("stress", "shmin")
	case *insitu.MeasuredModel:
		v.meas = *m
		if given("stress", "tensor") {
			v.byTensor = true
			for i, k := range []string{"nn", "ee", "dd", "ne", "nd", "ed"} {
				v.tensor[i] = num("stress", "tensor", k)
			}
		} else {
			for i := range 3 {
				is := strconv.Itoa(i + 1)
				v.mags[i] = num("stress", "principal", is, "magnitude")
				v.axes[i] = geom.Line{Trend: num("stress", "principal", is, "trend"), Plunge: num("stress", "principal", is, "plunge")}
			}
		}
	}
	switch c := s.Criterion.(type) {
	case *planes.Coulomb:
		v.coulomb, v.isCoul = *c, true
	case *planes.BartonBandis:
		v.barton = *c
	}
	if s.Slope != nil {
		v.slope, v.hasSlope = *s.Slope, true
		v.phiGiven = given("slope", "friction_angle")
		v.gammaGiven = given("slope", "unit_weight")
		v.toppleGiven = given("slope", "toppling_limit")
	}
	if s.Tunnel != nil {
		v.tunnel, v.hasTunnel = *s.Tunnel, true
	}
	return v
}

// Reset returns v to the site's own values.
func (v *Variant) Reset() {
	b := v.base
	*v = *b
	v.base = b
}

// Set changes the value of key k to x. The key must be one the site uses
// (a Path parsed against the site guarantees it) and not a plane key (see
// SetPlane); x is taken as valid (Finish and Check say otherwise). Set
// panics for a plane key or a key the site does not use.
func (v *Variant) Set(k Key, x float64) {
	switch {
	case k.IsPlane():
		panic("site: Variant.Set of a plane key: use SetPlane")
	case k == VerticalGradient:
		v.grad.VerticalGradient = x
	case k == VerticalDensity:
		v.density = x
	case k == SHmaxValue:
		v.grad.SHmax.Value = x
	case k == SHmaxOffset:
		v.grad.SHmax.Offset = x
	case k == SHmaxAzimuth:
		v.grad.Azimuth = geom.Azimuth(x)
	case k == ShminValue:
		v.grad.Shmin.Value = x
	case k == ShminOffset:
		v.grad.Shmin.Offset = x
	case k >= TensorNN && k <= TensorED:
		v.tensor[k-TensorNN] = x
		v.measDirty = true
	case k >= Principal1 && k <= Principal3:
		v.mags[k-Principal1] = x
		v.measDirty = true
	case k == ReferenceDepth:
		v.meas.ReferenceDepth = x
	case k == WaterGradient:
		v.water.Gradient = x
	case k == WaterTable:
		v.water.Table = x
	case k == WaterBiot:
		v.water.Biot = x
	case k == Friction:
		v.coulomb.Mu = x
	case k == Cohesion:
		v.coulomb.Cohesion = x
	case k == JRC:
		v.barton.JRC = x
	case k == JCS:
		v.barton.JCS = x
	case k == ResidualAngle:
		v.barton.Residual = x
	case k.Slope() && v.hasSlope:
		v.setSlope(k, x)
	case k == TunnelUCS && v.hasTunnel:
		v.tunnel.UCS = x
	case k == TunnelPoisson && v.hasTunnel:
		v.tunnel.Poisson = x
	default:
		panic(fmt.Sprintf("site: Variant.Set of key %d that the site does not use", k))
	}
}

func (v *Variant) setSlope(k Key, x float64) {
	sl := &v.slope
	switch k {
	case SlopeHeight:
		sl.Height = x
	case SlopeFrictionAngle:
		sl.FrictionAngle, v.phiGiven = x, true
	case SlopeLateralLimit:
		sl.LateralLimit = x
	case SlopeToppleLimit:
		sl.ToppleLimit, v.toppleGiven = x, true
	case SlopeUnitWeight:
		sl.UnitWeight, v.gammaGiven = x, true
	case SlopeFaceDip:
		sl.Face = planes.MustNew(x, sl.Face.DipDirection())
	case SlopeFaceDir:
		sl.Face = planes.MustNew(sl.Face.Dip(), geom.Azimuth(x))
	case SlopeTopDip:
		sl.Top = planes.MustNew(x, sl.Top.DipDirection())
	case SlopeTopDir:
		sl.Top = planes.MustNew(sl.Top.Dip(), geom.Azimuth(x))
	case SlopeCrack:
		sl.Crack = x
	}
}

// Finish works out what follows from the values set: Sv's gradient from a
// density, Shmin from SHmax under Sheorey's law on shmax alone, the water
// model inside the stress model, a measured model's principal stresses
// (only when a tensor component or principal magnitude was set), and the
// slope's defaults that follow other keys. It returns an error only when a
// measured model cannot be rebuilt from the values set.
func (v *Variant) Finish() error {
	if v.isGrad {
		if v.density > 0 {
			v.grad.VerticalGradient = insitu.DensityGradient(v.density)
		}
		if v.shminFollows {
			v.grad.Shmin = v.grad.SHmax
		}
		v.grad.Water = v.water
	} else {
		v.meas.Water = v.water
		if v.measDirty {
			var m *insitu.MeasuredModel
			var err error
			if v.byTensor {
				t, e := insitu.Components(v.tensor[0], v.tensor[1], v.tensor[2], v.tensor[3], v.tensor[4], v.tensor[5])
				if e != nil {
					return e
				}
				m, err = insitu.NewMeasuredModel(t, v.meas.ReferenceDepth, v.meas.Scaling, v.water)
			} else {
				p, _, e := insitu.FromPrincipal(v.mags, v.axes)
				if e != nil {
					return e
				}
				m, err = insitu.NewMeasuredPrincipal(p, v.meas.ReferenceDepth, v.meas.Scaling, v.water)
			}
			if err != nil {
				return err
			}
			v.meas, v.measDirty = *m, false
		}
	}
	if v.hasSlope {
		sl := &v.slope
		if !v.phiGiven {
			sl.FrictionAngle = math.Atan(v.Criterion().Friction()) * geom.Deg
		}
		if !v.gammaGiven && v.isGrad {
			sl.UnitWeight = v.grad.VerticalGradient
		}
		if !v.toppleGiven {
			sl.ToppleLimit = sl.LateralLimit
		}
		if v.isCoul {
			sl.Cohesion = v.coulomb.Cohesion
		}
	}
	return nil
}

// Check reports values that the site file's reader would refuse together:
// SHmax below Shmin under the same law, a Barton–Bandis or water value out
// of range, a face dipping 0°. Cases are checked; realisations are not (each
// value is drawn within its own range, and a realisation whose SHmax law
// gives less than its Shmin law is kept as drawn).
func (v *Variant) Check() error {
	if v.isGrad {
		g := v.grad
		if _, err := insitu.NewGradientModel(g.VerticalGradient, g.SHmax, g.Shmin, g.Azimuth, g.Water); err != nil {
			return err
		}
	} else if err := v.water.Validate(); err != nil {
		return err
	}
	if !v.isCoul {
		b := v.barton
		if _, err := planes.NewBartonBandis(b.JRC, b.JCS, b.Residual); err != nil {
			return err
		}
	}
	return nil
}

// Model returns the variant's stress model (pointing into v).
func (v *Variant) Model() insitu.Model {
	if v.isGrad {
		return &v.grad
	}
	return &v.meas
}

// Water returns the variant's water model.
func (v *Variant) Water() insitu.Water { return v.water }

// Criterion returns the variant's strength criterion (pointing into v).
func (v *Variant) Criterion() planes.Criterion {
	if v.isCoul {
		return &v.coulomb
	}
	return &v.barton
}

// Slope returns the variant's slope (pointing into v), nil without one.
func (v *Variant) Slope() *slope.Slope {
	if !v.hasSlope {
		return nil
	}
	return &v.slope
}

// Tunnel returns the variant's tunnel (pointing into v), nil without one.
func (v *Variant) Tunnel() *tunnel.Tunnel {
	if !v.hasTunnel {
		return nil
	}
	return &v.tunnel
}

// CriterionFor is Site.CriterionFor with the variant's criterion: the
// plane's own Coulomb criterion in scratch when it gives friction or
// cohesion, else the variant's.
func (v *Variant) CriterionFor(p *Plane, scratch *planes.Coulomb) planes.Criterion {
	hasMu, hasC := !math.IsNaN(p.Friction), !math.IsNaN(p.Cohesion)
	if !hasMu && !hasC {
		return v.Criterion()
	}
	*scratch = planes.Coulomb{}
	if v.isCoul {
		*scratch = v.coulomb
	}
	if hasMu {
		scratch.Mu = p.Friction
	}
	if hasC {
		scratch.Cohesion = p.Cohesion
	}
	return scratch
}

// Resolve writes into r the result for p in the variant's model, as
// Resolver.Resolve does for the site.
func (v *Variant) Resolve(p *Plane, r *planes.Result) {
	st := v.Model().At(p.Depth)
	if !math.IsNaN(p.PorePressure) {
		st.PorePressure = p.PorePressure
	}
	var scratch planes.Coulomb
	planes.ResolveTo(r, &st, &p.Orientation, v.CriterionFor(p, &scratch))
}

// SetPlane changes the plane column of key k of p to x (a dip direction
// taken modulo 360°). It panics for a key that is not a plane key.
func SetPlane(p *Plane, k Key, x float64) {
	switch k {
	case PlaneFriction:
		p.Friction = x
	case PlaneCohesion:
		p.Cohesion = x
	case PlanePorePressure:
		p.PorePressure = x
	case PlaneDip:
		p.Orientation = planes.MustNew(x, p.Orientation.DipDirection())
	case PlaneDipDirection:
		p.Orientation = planes.MustNew(p.Orientation.Dip(), geom.Azimuth(x))
	case PlaneDepth:
		p.Depth = x
	default:
		panic("site: SetPlane of a key that is not a plane's column")
	}
}
