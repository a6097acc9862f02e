package slope

import (
	"math"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestWedgeWaterShortForm(t *testing.T) {
	const tol = 1e-6
	// Hoek & Bray (1981), the wedge with cohesion, friction and water
	// pressure (memory of the published short form): with a flat top, no
	// tension crack, the wedge fully saturated (½γw·H at the middle of the
	// line, nothing on the face and the top),
	//
	//	FS = 3/(γH)·(cA X + cB Y) + (A − γw/(2γ) X) tan φA + (B − γw/(2γ) Y) tan φB
	//	X = sin θ24 / (sin θ45 cos θ2.na),  Y = sin θ13 / (sin θ35 cos θ1.nb)
	//	A = (cos ψa − cos ψb cos θna.nb) / (sin ψ5 sin² θna.nb),  B likewise
	//
	// lines 1, 2 the traces of A, B on the face, 3, 4 on the top, 5 the line
	// of intersection; na, nb the poles. Seeded random both-plane wedges.
	sl := wedgeSlope()
	face, top := sl.Face, sl.Top
	checked := 0
	ang := func(u, v r3.Vec) float64 {
		return math.Acos(math.Max(-1, math.Min(1, math.Abs(r3.Dot(r3.Unit(u), r3.Unit(v))))))
	}
	for i, p := range randomWedges(t, sl, 17, 200, WedgeBoth) {
		a, b := p[0], p[1]
		na, nb := a.Normal(), b.Normal()
		l1, l2 := r3.Cross(na, face.Normal()), r3.Cross(nb, face.Normal())
		l3, l4 := r3.Cross(na, top.Normal()), r3.Cross(nb, top.Normal())
		l5 := r3.Cross(na, nb)
		psi5 := math.Asin(math.Abs(r3.Unit(l5).Z))
		cab := r3.Dot(na, nb)
		X := math.Sin(ang(l2, l4)) / (math.Sin(ang(l4, l5)) * math.Cos(ang(l2, na)))
		Y := math.Sin(ang(l1, l3)) / (math.Sin(ang(l3, l5)) * math.Cos(ang(l1, nb)))
		A := (math.Cos(a.Dip()*geom.Rad) - math.Cos(b.Dip()*geom.Rad)*cab) / (math.Sin(psi5) * (1 - cab*cab))
		B := (math.Cos(b.Dip()*geom.Rad) - math.Cos(a.Dip()*geom.Rad)*cab) / (math.Sin(psi5) * (1 - cab*cab))
		st := Strength{PhiA: 25 + float64(i%10), PhiB: 30, CA: 0.02, CB: 0.01 * float64(i%4)}
		g, gw, h := sl.UnitWeight, insitu.Hydrostatic, sl.Height
		want := 3/(g*h)*(st.CA*X+st.CB*Y) + (A-gw/(2*g)*X)*math.Tan(st.PhiA*geom.Rad) + (B-gw/(2*g)*Y)*math.Tan(st.PhiB*geom.Rad)
		w, _ := NewWedgeBlock(sl, a, b)
		if w.NormalA.Z > 0 || w.NormalB.Z > 0 {
			continue // a plane overhangs the block: not the wedge the short form describes
		}
		checked++
		r := w.Solve(st, w.Saturated, Load{})
		if r.Mode != WedgeBoth {
			continue // the water lifted it off one plane: the short form does not apply
		}
		if !scalar.EqualWithinAbsOrRel(r.FS, want, tol, tol) {
			t.Errorf("%v %v: FS %v, short form %v", a, b, r.FS, want)
		}
		if dry := 3/(g*h)*(st.CA*X+st.CB*Y) + A*math.Tan(st.PhiA*geom.Rad) + B*math.Tan(st.PhiB*geom.Rad); !scalar.EqualWithinAbsOrRel(w.Solve(st, 0, Load{}).FS, dry, tol, tol) {
			t.Errorf("%v %v dry: FS %v, short form %v", a, b, w.Solve(st, 0, Load{}).FS, dry)
		}
	}
	if checked < 100 {
		t.Errorf("only %d wedges checked", checked)
	}
}

func TestWedgeCrackWater(t *testing.T) {
	const (
		tol      = 1e-9
		onPlane  = 1e-7 // m: a corner this close to a plane lies on it
		forceTol = 1e-7 // MN, absolute or relative
	)
	// Flat top, a crack 3 m behind the crest: the crack face is a triangle
	// with its foot k on the line of intersection dK below the top and its
	// other corners on the top. Hydrostatic pressure, linear over it: full,
	// V = γw·dK·area/3; with h m of water the wet part is the similar
	// triangle h/dK the size, V = γw·h·area·(h/dK)²/3. On plane A, with the
	// crack full, the pressure is γw·dK at k and 0 at the other corners (on
	// the face or the top), linear on the fan from O: UA = γw·dK·area(O, aK, k)/3
	// (derived).
	sl := wedgeSlope()
	sl.CrackGiven, sl.Crack = true, 3
	cut := 0
	for _, p := range randomWedges(t, sl, 37, 60, NoMode) {
		w, _ := NewWedgeBlock(sl, p[0], p[1])
		if !w.HasCrack() {
			continue
		}
		cut++
		dK := w.CrackDepth
		_, _, v := w.Water(dK)
		if want := insitu.Hydrostatic * dK * w.CrackArea / 3; !scalar.EqualWithinAbsOrRel(v, want, tol, tol) {
			t.Errorf("full crack: V %v, want %v", v, want)
		}
		h := dK / 3
		_, _, v = w.Water(h)
		if want := insitu.Hydrostatic * h * w.CrackArea * (h / dK) * (h / dK) / 3; !scalar.EqualWithinAbsOrRel(v, want, tol, tol) {
			t.Errorf("a third full: V %v, want %v", v, want)
		}
		var k, aK r3.Vec
		for _, f := range w.faces {
			if f.plane != onCrack {
				continue
			}
			for _, q := range f.pts {
				switch {
				case math.Abs(r3.Dot(q, w.NormalA)) < onPlane && math.Abs(r3.Dot(q, w.NormalB)) < onPlane:
					k = q
				case math.Abs(r3.Dot(q, w.NormalA)) < onPlane:
					aK = q
				}
			}
		}
		uA, _, _ := w.Water(dK)
		if want := insitu.Hydrostatic * dK * r3.Norm(r3.Cross(aK, k)) / 6; !scalar.EqualWithinAbsOrRel(uA, want, forceTol, forceTol) {
			t.Errorf("full crack: UA %v, want %v", uA, want)
		}
		// A crack given by its depth at the line is that deep there.
		bd := sl
		bd.CrackByDepth, bd.Crack = true, dK/2
		if wd, err := NewWedgeBlock(bd, p[0], p[1]); err != nil || !scalar.EqualWithinAbs(wd.CrackDepth, dK/2, tol) {
			t.Errorf("crack by depth %v: %v, %v", dK/2, wd.CrackDepth, err)
		}
	}
	if cut < 30 {
		t.Errorf("only %d of 60 wedges cut by the crack", cut)
	}
}
