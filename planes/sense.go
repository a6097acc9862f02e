package planes

import "math"

// Sense is the sense of slip of the hanging wall, read from the rake. On a
// plane within NearVertical of vertical, dip-slip has no normal or reverse
// sense (which block is the hanging wall depends on which of the two dip
// directions was typed): such a plane gets one of the side-up senses, which
// name the side of the plane that goes up (Side), and keeps sinistral and
// dextral. The value packs the kind in its low four bits and the side above
// them; compare kinds with Kind.
type Sense int

const (
	// NoSlip: no shear stress on the plane, or a plane within
	// NearHorizontal of horizontal, which has no strike to name a sense by.
	NoSlip Sense = iota
	Sinistral
	SinistralReverse
	Reverse
	DextralReverse
	Dextral
	DextralNormal
	NormalSlip
	SinistralNormal
	// SideUp: dip-slip on a (near-)vertical plane; Side says which side of
	// the plane goes up.
	SideUp
	// SinistralSideUp and DextralSideUp: oblique slip on a (near-)vertical
	// plane.
	SinistralSideUp
	DextralSideUp
)

// Side is a compass direction naming one side of a (near-)vertical plane:
// the eight points of the compass, 45° apart.
type Side uint8

const (
	NoSide Side = iota
	North
	Northeast
	East
	Southeast
	South
	Southwest
	West
	Northwest
)

var sideNames = [...]string{"", "north", "northeast", "east", "southeast", "south", "southwest", "west", "northwest"}

// String returns the side as written in the tables, e.g. "northeast"; NoSide
// is "".
func (s Side) String() string { return sideNames[s] }

// SideOf returns the compass point nearest the azimuth az (degrees): north
// covers [337.5, 22.5), northeast [22.5, 67.5), and so on; an azimuth half
// way between two points goes to the clockwise one, so that opposite
// azimuths always get opposite points.
func SideOf(az float64) Side {
	k := int(math.Floor(az/45+0.5)) % 8
	if k < 0 {
		k += 8
	}
	return Side(k + 1)
}

// Kind returns the sense without its side.
func (s Sense) Kind() Sense { return s & 15 }

// Side returns the side that goes up for the side-up senses, NoSide for
// the others.
func (s Sense) Side() Side { return Side(s >> 4) }

// WithSide returns the side-up sense kind (SideUp, SinistralSideUp or
// DextralSideUp) with side up going up. It panics for other kinds.
func WithSide(kind Sense, up Side) Sense {
	if kind < SideUp || kind > DextralSideUp || up == NoSide || up > Northwest {
		panic("planes: WithSide needs a side-up kind and a side")
	}
	return kind | Sense(up)<<4
}

var senseNames = [...]string{"", "sinistral", "sinistral-reverse", "reverse", "dextral-reverse", "dextral", "dextral-normal", "normal", "sinistral-normal"}

// sideSenseNames holds every side-up sense's name, built once:
// [kind − SideUp][side] → "east-side-up", "sinistral-east-side-up", …
var sideSenseNames = func() (t [3][9]string) {
	for k, pre := range [3]string{"", "sinistral-", "dextral-"} {
		for s := North; s <= Northwest; s++ {
			t[k][s] = pre + s.String() + "-side-up"
		}
	}
	return t
}()

// String returns the sense as written in the tables; NoSlip is "". It does
// not allocate.
func (s Sense) String() string {
	if k := s.Kind(); k >= SideUp {
		return sideSenseNames[k-SideUp][s.Side()]
	}
	return senseNames[s]
}

// SenseOf returns the sense of slip for a rake in degrees (Aki & Richards
// 1980: 0 sinistral, +90 reverse, ±180 dextral, −90 normal). The circle is cut
// into eight 45° sectors centred on the pure senses: a rake within 22.5° of
// 90 is reverse, between 22.5° and 67.5° sinistral-reverse, and so on. A
// boundary rake goes to the pure sense. NaN gives NoSlip.
func SenseOf(rake float64) Sense {
	if math.IsNaN(rake) {
		return NoSlip
	}
	r := rake
	if r < 0 || r >= 360 {
		r = math.Mod(r, 360)
		if r < 0 {
			r += 360
		}
	}
	// Sector k covers [45k − 22.5, 45k + 22.5], k = 0 at rake 0; a rake
	// exactly on an edge belongs to the pure sense (even k).
	x := (r + 22.5) / 45
	k := int(x)
	if k%2 == 1 && float64(k) == x {
		k--
	}
	return senseOrder[k%8]
}

var senseOrder = [8]Sense{Sinistral, SinistralReverse, Reverse, DextralReverse, Dextral, DextralNormal, NormalSlip, SinistralNormal}

// VerticalSenseOf returns the sense of slip on a plane within NearVertical
// of vertical, typed with dip direction dd and slipping at rake (degrees,
// of the hanging wall: the block on the dd side). The sectors are those of
// SenseOf; a reverse part means that the dd side goes up, a normal part
// that the opposite side does:
//
//	reverse → SideUp of SideOf(dd),   normal → SideUp of SideOf(dd + 180)
//
// and likewise for the oblique sectors; sinistral and dextral are kept. The
// plane typed with dd + 180 has the rake −rake and gets the same sense.
// NaN gives NoSlip.
func VerticalSenseOf(rake, dd float64) Sense {
	s := SenseOf(rake)
	up, down := SideOf(dd), SideOf(dd+180)
	switch s {
	case Reverse:
		return WithSide(SideUp, up)
	case NormalSlip:
		return WithSide(SideUp, down)
	case SinistralReverse:
		return WithSide(SinistralSideUp, up)
	case SinistralNormal:
		return WithSide(SinistralSideUp, down)
	case DextralReverse:
		return WithSide(DextralSideUp, up)
	case DextralNormal:
		return WithSide(DextralSideUp, down)
	}
	return s
}
