package tunnel

import (
	"fmt"
	"sort"
)

// Leg is a straight leg of a tunnel alignment, chainages in m.
type Leg struct {
	From, To      float64
	Trend, Plunge float64 // of the drive, °; plunge negative for a rising drive
}

// Tunnel is an alignment to screen, with every default applied.
type Tunnel struct {
	Legs    []Leg        // in chainage order, joined end to start
	Cover   [][2]float64 // (chainage, cover above the crown), m, increasing chainage
	Spacing float64      // m between stations, > 0
	Radius  float64      // m, > 0
	UCS     float64      // MPa, > 0
	Poisson float64      // ν of the rock
	Sets    []string     // planes and sets to screen, by name; nil for all
	Drained bool         // wall pore pressure 0 (else the far field's)

	// Support is the internal support pressure on the wall, MPa ≥ 0 (the
	// Lamé term of opening.Circle): σr = Support at the wall, σθ lowered by
	// it. A watertight lining (Drained false) should carry at least the
	// water pressure.
	Support float64
	// ZoneLimit is the depth of a slip zone beyond the wall (m) past which a
	// stretch is reported (Screening.Deeper); 0 for Radius/2.
	ZoneLimit float64
	// Influence is the radius of influence of a drained wall's inflow, m from
	// the axis, > Radius (see Drained); 0 for the default at each station,
	// twice the head of water over the axis and at least 2·Radius
	// (DefaultInfluence).
	Influence float64
	// ZoneGrid is the grid of the slip-zone search; zero fields take the
	// defaults of Grid.
	ZoneGrid Grid
	// NoZones skips the slip-zone search (Row.Zone left empty), for callers
	// that need only the far-field and wall screening, such as many
	// realisations of one site.
	NoZones bool
}

// Limit returns the zone depth limit, m: ZoneLimit, or Radius/2 when it is 0.
func (t *Tunnel) Limit() float64 {
	if t.ZoneLimit == 0 {
		return t.Radius / 2
	}
	return t.ZoneLimit
}

// Station is a point of the alignment where the tunnel is screened.
type Station struct {
	Chainage      float64
	Trend, Plunge float64 // of the drive
	Cover         float64 // m of rock above the crown
	Depth         float64 // of the tunnel axis: cover + radius
}

// CoverAt interpolates the cover profile linearly at chainage ch; false
// outside the profile.
func (t *Tunnel) CoverAt(ch float64) (float64, bool) {
	c := t.Cover
	if ch < c[0][0] || ch > c[len(c)-1][0] {
		return 0, false
	}
	i := sort.Search(len(c), func(i int) bool { return c[i][0] >= ch })
	if c[i][0] == ch {
		return c[i][1], true
	}
	a, b := c[i-1], c[i]
	return a[1] + (b[1]-a[1])*(ch-a[0])/(b[0]-a[0]), true
}

// OutsideCover is the error of a station that lies outside the cover
// profile.
type OutsideCover struct {
	Chainage, From, To float64
}

func (e *OutsideCover) Error() string {
	return fmt.Sprintf("station at chainage %g m lies outside the cover profile (%g to %g m)", e.Chainage, e.From, e.To)
}

// Stations returns the stations every Spacing from the start of the first
// leg, and the end of the last; a station on a leg boundary takes the drive
// of the leg it starts. A station outside the cover profile is an
// *OutsideCover error.
func (t *Tunnel) Stations() ([]Station, error) {
	start, end := t.Legs[0].From, t.Legs[len(t.Legs)-1].To
	var chs []float64
	for k := 0; ; k++ {
		ch := start + float64(k)*t.Spacing
		if ch >= end-1e-9 {
			break
		}
		chs = append(chs, ch)
	}
	chs = append(chs, end)
	var out []Station
	leg := 0
	for _, ch := range chs {
		for leg < len(t.Legs)-1 && ch >= t.Legs[leg].To {
			leg++
		}
		cover, ok := t.CoverAt(ch)
		if !ok {
			return nil, &OutsideCover{Chainage: ch, From: t.Cover[0][0], To: t.Cover[len(t.Cover)-1][0]}
		}
		l := t.Legs[leg]
		out = append(out, Station{Chainage: ch, Trend: l.Trend, Plunge: l.Plunge, Cover: cover, Depth: cover + t.Radius})
	}
	return out, nil
}
