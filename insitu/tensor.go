package insitu

import (
	"cleft/insitu/geom"

	"fmt"
	"math"

	"gonum.org/v1/gonum/mat"
	"gonum.org/v1/gonum/spatial/r3"
)

// Tensor is a symmetric stress tensor in the NED frame, compression positive,
// in MPa. NN is σxx (north–north), NE is σxy (north–east), ND is σxz, and so on.
type Tensor struct {
	NN, EE, DD, NE, ND, ED float64
}

// Components returns a Tensor from its six independent components in MPa,
// compression positive. It is an error for any component to be NaN or ±Inf.
func Components(nn, ee, dd, ne, nd, ed float64) (Tensor, error) {
	t := Tensor{NN: nn, EE: ee, DD: dd, NE: ne, ND: nd, ED: ed}
	for i, v := range []float64{nn, ee, dd, ne, nd, ed} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return Tensor{}, fmt.Errorf("component %s is %v: want a finite number", componentNames[i], v)
		}
	}
	return t, nil
}

var componentNames = [6]string{"nn", "ee", "dd", "ne", "nd", "ed"}

// Andersonian returns the tensor with one principal stress vertical: sv, and
// the horizontal principal stresses shmax, acting along the azimuth az
// (degrees), and shmin across it. All in MPa, compression positive:
//
//	σ = SHmax·h hᵀ + Shmin·m mᵀ + Sv·z zᵀ,  h = (cos az, sin az, 0), m = (−sin az, cos az, 0)
func Andersonian(shmax, shmin, sv, az float64) Tensor {
	s, c := geom.SinCosDeg(az)
	return andersonian(shmax, shmin, sv, s, c)
}

// andersonian is Andersonian with the azimuth given by its sine and cosine.
func andersonian(shmax, shmin, sv, s, c float64) Tensor {
	return Tensor{
		NN: shmax*c*c + shmin*s*s,
		EE: shmax*s*s + shmin*c*c,
		DD: sv,
		NE: (shmax - shmin) * c * s,
	}
}

// Apply returns the traction σ·n on the plane with unit normal n.
func (t Tensor) Apply(n r3.Vec) r3.Vec {
	return r3.Vec{
		X: t.NN*n.X + t.NE*n.Y + t.ND*n.Z,
		Y: t.NE*n.X + t.EE*n.Y + t.ED*n.Z,
		Z: t.ND*n.X + t.ED*n.Y + t.DD*n.Z,
	}
}

// Trace returns σxx + σyy + σzz, three times the mean stress.
func (t Tensor) Trace() float64 { return t.NN + t.EE + t.DD }

// Scale returns f·t.
func (t Tensor) Scale(f float64) Tensor {
	return Tensor{t.NN * f, t.EE * f, t.DD * f, t.NE * f, t.ND * f, t.ED * f}
}

// Rotate returns the components of t in the frame whose axes are the rows of
// q (unit, orthogonal): t' = q·σ·qᵀ. The result is in that frame, not NED.
func (t Tensor) Rotate(q [3]r3.Vec) Tensor {
	var a [3]r3.Vec
	for i := range 3 {
		a[i] = t.Apply(q[i])
	}
	return Tensor{
		NN: r3.Dot(q[0], a[0]), EE: r3.Dot(q[1], a[1]), DD: r3.Dot(q[2], a[2]),
		NE: r3.Dot(q[0], a[1]), ND: r3.Dot(q[0], a[2]), ED: r3.Dot(q[1], a[2]),
	}
}

// Sym returns t as a gonum symmetric matrix, rows and columns in N, E, D order.
func (t Tensor) Sym() *mat.SymDense {
	return mat.NewSymDense(3, []float64{
		t.NN, t.NE, t.ND,
		t.NE, t.EE, t.ED,
		t.ND, t.ED, t.DD,
	})
}

// Principal returns the principal stresses of t, σ1 ≥ σ2 ≥ σ3, with their
// axes as a right-handed triad (geom.EigenDescending). Principal allocates:
// call it once per state, not once per plane.
func (t Tensor) Principal() Principal {
	v, a, ok := geom.EigenDescending(geom.Sym3{XX: t.NN, YY: t.EE, ZZ: t.DD, XY: t.NE, XZ: t.ND, YZ: t.ED})
	if !ok {
		// The decomposition fails only for non-finite input, which Components rejects.
		panic("insitu: eigen decomposition failed for a non-finite tensor")
	}
	return Principal{Values: v, Axes: a}
}
