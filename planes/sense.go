package planes

import "math"

// Sense is the sense of slip of the hanging wall, read from the rake.
type Sense int

const (
	// NoSlip: no shear stress on the plane, so no rake.
	NoSlip Sense = iota
	Sinistral
	SinistralReverse
	Reverse
	DextralReverse
	Dextral
	DextralNormal
	NormalSlip
	SinistralNormal
)

var senseNames = [...]string{"", "sinistral", "sinistral-reverse", "reverse", "dextral-reverse", "dextral", "dextral-normal", "normal", "sinistral-normal"}

// String returns the sense as written in the tables; NoSlip is "".
func (s Sense) String() string { return senseNames[s] }

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
