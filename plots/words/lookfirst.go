package words

import (
	"fmt"
	"math"
	"strings"

	"cleft/planes"
	"cleft/planes/decide"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// LookFirst puts each finding in one sentence: what it is, the one number
// that matters, why (its own inputs, the water case, the far field) and,
// with cases or a Monte Carlo, how sure.
func LookFirst(fs []decide.Finding) []string {
	out := make([]string, len(fs))
	for i := range fs {
		out[i] = Finding(&fs[i])
	}
	return out
}

// Finding is one finding in a sentence.
func Finding(f *decide.Finding) string {
	var s string
	switch f.Kind {
	case decide.Plane, decide.SetMean, decide.Readings:
		s = planeFinding(f)
	case decide.Planar, decide.Wedge, decide.Toppling:
		s = slopeFinding(f)
	case decide.TunnelWall:
		s = fmt.Sprintf("Tunnel wall: σmax/UCS %s at chainage %g m, %s", Fixed(f.PlainValue, 2), f.Chainage, spallingBand(f.PlainValue))
		if len(f.Stretches) > 0 {
			s += fmt.Sprintf("; σmax/UCS ≥ 0.3 at %s m", Stretches(f.Stretches))
		}
	case decide.TunnelZone:
		s = zoneFinding(f)
	}
	return s + chanceClause(f) + "."
}

// spallingBand names the band of σmax/UCS.
func spallingBand(ratio float64) string {
	switch {
	case ratio > 0.5:
		return "past the onset of spalling (0.4 ± 0.1)"
	case ratio >= 0.3:
		return "at the onset of spalling (0.4 ± 0.1)"
	}
	return "below the onset of spalling"
}

// planeFinding is a plane, set mean or set of readings: its state and
// number, then its own inputs.
func planeFinding(f *decide.Finding) string {
	r := f.Result
	where := fmt.Sprintf("%s (%s at %g m)", f.Name, f.Orientation, f.Depth)
	switch f.Kind {
	case decide.SetMean:
		where = fmt.Sprintf("Set %s, mean plane %s at %g m", strings.TrimSuffix(f.Name, " mean"), f.Orientation, f.Depth)
	case decide.Readings:
		of := fmt.Sprintf("the least stable of the %d readings of %s", f.Of, f.Set)
		if f.Set == "unassigned" {
			of = fmt.Sprintf("the least stable of the %d unassigned readings", f.Of)
		}
		where = fmt.Sprintf("%s (%s at %g m), %s", f.Name, f.Orientation, f.Depth, of)
	}
	s := where + ": " + resultClause(r)
	if f.Kind == decide.Readings && f.Count > 0 {
		s += fmt.Sprintf("; %d of the %d are critical or opening", f.Count, f.Of)
	}
	return s + ownClause(f)
}

// resultClause is a plane's state and its one number: σn' when opening,
// else the factor of safety and the pressure to slip.
func resultClause(r planes.Result) string {
	switch {
	case r.State == planes.Opening:
		return fmt.Sprintf("opening, σn' %s MPa", Signed(r.EffectiveNormal))
	case math.IsNaN(r.FactorOfSafety):
		return "carries no shear stress"
	case r.PressureToSlip < 0:
		return fmt.Sprintf("%s, FS %s, %s MPa of pore pressure past its strength", r.State, Fixed(r.FactorOfSafety, 2), Fixed(-r.PressureToSlip, 2))
	case r.OpensFirst:
		return fmt.Sprintf("FS %s; it would open (its cohesion carrying the shear stress until then) after a %s MPa rise in pore pressure", Fixed(r.FactorOfSafety, 2), Fixed(r.PressureToSlip, 2))
	}
	return fmt.Sprintf("FS %s; it would slip after a %s MPa rise in pore pressure", Fixed(r.FactorOfSafety, 2), Fixed(r.PressureToSlip, 2))
}

// ownValues names a plane's own inputs of the bits want, e.g. "μ 0.45,
// Pp 2.90 MPa".
func ownValues(o decide.Own, want decide.Reason) []string {
	var out []string
	if want.Has(decide.OwnFriction) && !math.IsNaN(o.Friction) {
		out = append(out, "μ "+Num(o.Friction))
	}
	if want.Has(decide.OwnCohesion) && !math.IsNaN(o.Cohesion) {
		out = append(out, "c "+Num(o.Cohesion)+" MPa")
	}
	if want.Has(decide.OwnPorePressure) && !math.IsNaN(o.PorePressure) {
		out = append(out, "Pp "+Fixed(o.PorePressure, 2)+" MPa")
	}
	return out
}

const ownBits = decide.OwnFriction | decide.OwnCohesion | decide.OwnPorePressure

// ownClause says which of a plane's own inputs decide its standing (with
// the site's values instead, what it would be) and which it merely has.
func ownClause(f *decide.Finding) string {
	if len(f.Own) == 0 {
		return ""
	}
	o := f.Own[0]
	var s string
	if d := ownValues(o, f.Decisive); len(d) > 0 {
		var site []string
		if v := ownValues(f.SiteOwn, f.Decisive&(decide.OwnFriction|decide.OwnCohesion)); len(v) > 0 {
			site = append(site, "the site's "+join(v))
		}
		if v := ownValues(f.SiteOwn, f.Decisive&decide.OwnPorePressure); len(v) > 0 {
			site = append(site, "the water model's "+join(v))
		}
		if len(site) == 0 {
			site = []string{"the site's values"}
		}
		s = fmt.Sprintf(", because of its own %s (with %s: %s)", join(d), join(site), siteClause(f.Site))
	}
	if rest := ownValues(o, ownBits&^f.Decisive); len(rest) > 0 {
		s += ", with its own " + join(rest)
	}
	return s
}

// siteClause is a plane's result with the site's values: "stable, FS 1.24".
func siteClause(r planes.Result) string {
	if r.State == planes.Opening {
		return fmt.Sprintf("still opening, σn' %s MPa", Signed(r.EffectiveNormal))
	}
	return fmt.Sprintf("%s, FS %s", r.State, Fixed(r.FactorOfSafety, 2))
}

// join joins words as "a, b and c".
func join(s []string) string {
	if len(s) < 2 {
		return strings.Join(s, "")
	}
	return strings.Join(s[:len(s)-1], ", ") + " and " + s[len(s)-1]
}

// slopeFinding is a slope case: its least factor of safety and water case,
// the most favourable for contrast, what brings it to 1, and the own
// strength of its planes.
func slopeFinding(f *decide.Finding) string {
	var s string
	switch f.Kind {
	case decide.Planar:
		s = "Planar sliding on " + f.Name
	case decide.Wedge:
		s = "Wedge " + f.Name
	default:
		s = "Flexural toppling on " + f.Name
	}
	if f.Plain != decide.FactorOfSafety {
		s += ": kinematically possible"
		switch {
		case f.Kind == decide.Toppling:
			s += " (no factor of safety is worked out for toppling)"
		case f.Reasons.Has(decide.NoBlock):
			s += ", but its block is outside the limit-equilibrium model: no factor of safety (see slope.csv)"
		}
		return s + slopeOwn(f)
	}
	fs := slopeFS(f)
	s += ": FS " + fs
	if f.Kind == decide.Wedge {
		switch f.Mode {
		case slope.WedgeBoth:
			s += ", sliding on both planes"
		case slope.WedgeOnFirst, slope.WedgeOnSecond:
			s += ", sliding on one plane alone"
		case slope.LiftOff:
			s += ", pushed off both planes"
		}
	}
	if f.Kind == decide.Planar && !math.IsNaN(f.CrackDepth) {
		switch {
		case f.ToFail == 0:
			s += fmt.Sprintf("; at or below 1 even dry (crack %s m)", Fixed(f.CrackDepth, 1))
		case !math.IsNaN(f.ToFail):
			s += fmt.Sprintf("; it falls to 1 with %s m of water in the %s m crack", Fixed(f.ToFail, 1), Fixed(f.CrackDepth, 1))
		}
	}
	if f.PlainValue > 1 && f.PlainValue < f.Target {
		s += fmt.Sprintf(", below the target %s", Num(f.Target))
	}
	return s + slopeOwn(f)
}

// slopeFS is a slope case's least factor of safety with its water case,
// and the largest with its case when they differ: "0.57 saturated (1.11
// dry)".
func slopeFS(f *decide.Finding) string {
	v := f.PlainValue
	out := fmt.Sprintf("%s %s", FS(v), WaterCase(f.Water))
	if !math.IsNaN(f.Best) && f.Best != v {
		out += fmt.Sprintf(" (%s %s)", FS(f.Best), WaterCase(f.BestWater))
	}
	return out
}

// slopeOwn names the own strength of a case's planes: ", with J-cut-3's own
// c 0.04 MPa".
func slopeOwn(f *decide.Finding) string {
	var parts []string
	for _, o := range f.Own {
		if v := ownValues(o, decide.OwnFriction|decide.OwnCohesion); len(v) > 0 {
			parts = append(parts, o.Name+"'s own "+join(v))
		}
	}
	if len(parts) == 0 {
		return ""
	}
	return ", with " + join(parts)
}

// zoneFinding is a plane or set along the tunnel: where it has no bound,
// its deepest zone, and where that passes the limit.
func zoneFinding(f *decide.Finding) string {
	s := f.Name + " along the tunnel: "
	if len(f.FarStretches) > 0 {
		s += fmt.Sprintf("critical or opening in the far field at %s m, so its slip zone has no bound there", Stretches(f.FarStretches))
		if f.Extent == tunnel.Bounded {
			s += fmt.Sprintf("; elsewhere up to %s m beyond the wall (at %g m)", Fixed(f.PlainValue, 2), f.Chainage)
		}
	} else if f.Extent == tunnel.PastGrid {
		s += fmt.Sprintf("slip zone at least %s m beyond the wall at %g m (it reaches the edge of the search)", Fixed(f.PlainValue, 1), f.Chainage)
	} else {
		s += fmt.Sprintf("slip zone up to %s m beyond the wall at %g m", Fixed(f.PlainValue, 2), f.Chainage)
	}
	if len(f.Stretches) > 0 && len(f.FarStretches) == 0 {
		s += fmt.Sprintf(", deeper than the limit of %s m at %s m", Num(f.Limit), Stretches(f.Stretches))
	} else if len(f.Stretches) == 0 {
		s += fmt.Sprintf(", within the limit of %s m", Num(f.Limit))
	}
	if len(f.Own) > 0 {
		if v := ownValues(f.Own[0], ownBits); len(v) > 0 {
			s += ", with its own " + join(v)
		}
	}
	return s
}

// chanceClause is how sure a finding is: its cases and its probability.
func chanceClause(f *decide.Finding) string {
	var parts []string
	if f.Cases > 1 {
		parts = append(parts, fmt.Sprintf("critical or opening in %d of %d cases", f.Unstable, f.Cases))
	}
	if !math.IsNaN(f.P) {
		switch f.Kind {
		case decide.Planar, decide.Wedge:
			parts = append(parts, fmt.Sprintf("P(FS < 1) %s %s", Proportion(f.P, f.SE), WaterCase(f.PWater)))
		case decide.TunnelZone:
			if f.P > 0 {
				parts = append(parts, fmt.Sprintf("P(critical or opening in the far field) up to %s at %g m", Proportion(f.P, f.SE), f.PChainage))
			} else {
				parts = append(parts, "P(critical or opening in the far field) 0 at every station")
			}
		default:
			parts = append(parts, "P(critical or opening) "+Proportion(f.P, f.SE))
		}
	}
	if len(parts) == 0 {
		return ""
	}
	return "; " + strings.Join(parts, ", ")
}
