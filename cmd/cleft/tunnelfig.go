package main

import (
	"fmt"
	"math"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/planes/tunnel"
	"cleft/plots"
	"cleft/plots/words"
)

// tunnelFigures are the along-alignment chart, the cross-section with the
// slip zones at station section and the perimeter plot of station wall.
func tunnelFigures(s *site.Site, sc *tunnel.Screening, section, wall int) []*namedFigure {
	t := sc.Tunnel
	pr := &plots.TunnelProfile{
		Site:      s.Name,
		Lines:     []string{fmt.Sprintf("Along the alignment: chainage %g to %g m, radius %g m, UCS %g MPa", sc.Stations[0].Chainage, sc.Stations[len(sc.Stations)-1].Chainage, t.Radius, t.UCS), s.Summary()},
		ZoneLimit: t.Limit(),
	}
	for _, ts := range sc.Stations {
		pr.Chainage = append(pr.Chainage, ts.Chainage)
		pr.Cover = append(pr.Cover, ts.Cover)
		pr.Ratio = append(pr.Ratio, ts.Ratio)
	}
	for i, tg := range sc.Targets {
		se := plots.TunnelSeries{Name: tg.Name, ZoneDepth: []float64{}}
		for _, ts := range sc.Stations {
			r := ts.Rows[i]
			se.FS = append(se.FS, r.Far.FactorOfSafety)
			se.FarBad = append(se.FarBad, r.Far.State != planes.Stable)
			se.WallSlip = append(se.WallSlip, len(r.Critical) > 0 || len(r.Opening) > 0)
			se.ZoneDepth = append(se.ZoneDepth, r.Zone.Depth)
		}
		pr.Series = append(pr.Series, se)
	}
	return []*namedFigure{
		{file: "tunnel-profile",
			title:   "Along the tunnel alignment",
			caption: fmt.Sprintf("Panels over the chainage, top down. Cover above the crown. The largest boundary stress at the wall against the UCS, with the band of the onset of spalling, 0.4 ± 0.1 (Martin, Kaiser & McCreath 1999). The far-field factor of safety of each plane or set at the axis depth, each with its own strength, on a logarithmic scale (values beyond its ends are drawn at the end as open triangles, and the key says so); the dotted red line is FS = 1. The greatest depth beyond the wall of each one's zone of potential slip in the rock round the opening, against the zone depth limit of %s m (dashed red), shaded where some plane is critical or opening in the far field: there its zone has no bound, and the panel shows the depth found near the opening. Last, one lane per plane or set: dark where it is critical or opening in the far field, light where only somewhere on the wall. Each plane or set has its own colour (the same as on the cross-section), dashes and marker, its markers at stations of its own, so that series on the same values still show apart.", words.Num(t.Limit())),
			fig:     pr, w: cm(19, 0), h: cm(24, 0)},
		sectionFigure(s, sc, section),
		wallFigure(s, sc, wall),
	}
}

// sectionFigure is the cross-section of station i with each target's zone.
func sectionFigure(s *site.Site, sc *tunnel.Screening, i int) *namedFigure {
	t := sc.Tunnel
	ts := sc.Stations[i]
	g := t.ZoneGrid
	outer := tunnel.DefaultOuter
	if g.Outer != 0 {
		outer = g.Outer
	}
	f := &plots.TunnelSection{
		Site:   s.Name,
		Lines:  []string{fmt.Sprintf("Cross-section at chainage %g m: cover %.0f m, axis at %.0f m, drive %03.0f/%.1f, looking along the drive", ts.Chainage, ts.Cover, ts.Depth, ts.Trend, ts.Plunge)},
		Radius: t.Radius,
		Limit:  t.Limit(),
		Outer:  outer * t.Radius,
	}
	for k, tg := range sc.Targets {
		r := &ts.Rows[k]
		z := plots.SectionZone{Name: tg.Name, Depth: math.NaN(), Angle: math.NaN(), Note: words.ZoneKey(r)}
		for _, sp := range sc.Outline(i, k) {
			z.Theta = append(z.Theta, sp.Theta)
			z.Inner = append(z.Inner, sp.Inner)
			z.Outer = append(z.Outer, sp.Outer)
		}
		if r.Zone.Flags.Has(tunnel.Exists) && !r.Zone.Flags.Has(tunnel.ReachesOuter) {
			z.Depth, z.Angle = r.Zone.Depth, r.Zone.Angle
		}
		z.Trace, _ = tunnel.TraceAngle(tg.Orientation, ts.Up, ts.Right, ts.Along)
		f.Zones = append(f.Zones, z)
	}
	return &namedFigure{file: "tunnel-section",
		title:   fmt.Sprintf("Zones of potential slip round the opening at chainage %g m", ts.Chainage),
		caption: "Looking along the drive, crown up. Each filled, outlined region is where a plane or set, with its own strength, is critical (FS ≤ 1) or opening (σn' ≤ 0) under the full elastic stress in the rock round a circular opening (Kirsch 1898, with the anti-plane terms) and the pore pressure of the wall's rule; the zones of the sets overlap where they share rock. Thin lines are the traces of each set across the section at its apparent dip. A line with a dot marks the deepest point of each zone whose depth is known, with that depth beyond the wall; the dashed ring is the zone depth limit. Each plane or set keeps its colour on the along-alignment chart. " + words.ZoneCaution,
		fig:     f, w: cm(19, 0), h: cm(13, 0)}
}

// wallFigure is the perimeter plot of station i.
func wallFigure(s *site.Site, sc *tunnel.Screening, i int) *namedFigure {
	t := sc.Tunnel
	ts := sc.Stations[i]
	wall := &plots.TunnelWall{
		Site:     s.Name,
		Lines:    []string{fmt.Sprintf("Wall of the opening at chainage %g m: cover %.0f m, axis at %.0f m, drive %03.0f/%.1f, looking along the drive", ts.Chainage, ts.Cover, ts.Depth, ts.Trend, ts.Plunge)},
		Step:     tunnel.PerimeterStep,
		UCS:      t.UCS,
		Radius:   t.Radius,
		ThetaMax: plots.WallPeak{Stress: ts.ThetaMax.Stress, At: ts.ThetaMax.Theta},
		WallMax:  plots.WallPeak{Stress: ts.WallMax.Stress, At: ts.WallMax.Theta},
	}
	for _, w := range ts.Wall {
		wall.Sigma = append(wall.Sigma, w.Theta)
	}
	for k, tg := range sc.Targets {
		ws := plots.WallSet{Name: tg.Name}
		for _, st := range ts.Rows[k].Wall {
			ws.Critical = append(ws.Critical, st == planes.Critical)
			ws.Opening = append(ws.Opening, st == planes.Opening)
		}
		wall.Sets = append(wall.Sets, ws)
	}
	return &namedFigure{file: "tunnel-wall",
		title:   fmt.Sprintf("Wall of the opening at chainage %g m", ts.Chainage),
		caption: "Looking along the drive, crown up. The curve is the tangential stress σθ round the wall (Kirsch 1898, with the out-of-plane terms of Hiramatsu & Oka 1962), compression outward. Each ring is a plane or set, named outside the rings, inner to outer in the key's order: solid red arcs are where the wall stress resolved on it reaches its strength, dashed blue arcs where it opens.",
		fig:     wall, w: cm(19, 0), h: cm(13, 0)}
}
