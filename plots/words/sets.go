package words

import (
	"fmt"
	"strings"

	"cleft/planes/sets"
)

// Grouping says how the sets were found, in a sentence or two.
func Grouping(g *sets.Grouping) string {
	var b strings.Builder
	an := g.Analysis
	n := len(an.Sets)
	switch {
	case len(g.Config.Seeds) > 0:
		fmt.Fprintf(&b, "%d sets from the given seeds by spherical k-means on axes.", n)
	case !an.Auto:
		fmt.Fprintf(&b, "%d sets as asked, by spherical k-means on axes (k-means++ starts, best of ten, fixed seed).", n)
	case len(an.Scores) <= 2: // no grouping into two sets or more could be tried
		fmt.Fprintf(&b, "%s too few to compare groupings into sets: one set.", Plural(len(g.Poles), "reading is", "readings are"))
	default:
		var sc []string
		for k := 2; k < len(an.Scores); k++ {
			sc = append(sc, fmt.Sprintf("%d: %.2f", k, an.Scores[k]))
		}
		of := ""
		if an.ChosenOn < len(g.Poles) {
			of = fmt.Sprintf(" of %d of the readings, spread evenly through them,", an.ChosenOn)
		}
		fmt.Fprintf(&b, "The number of sets was chosen by the mean silhouette width (Rousseeuw 1987; axial angle as the distance) of k-means groupings%s with 2 to %d sets — %s — ", of, len(an.Scores)-1, strings.Join(sc, ", "))
		if n == 1 {
			b.WriteString("none reaching 0.25, read as no substantial structure (Kaufman & Rousseeuw 1990): one set.")
		} else {
			fmt.Fprintf(&b, "the largest at %d sets.", n)
		}
	}
	if g.Config.MaxAngle > 0 {
		fmt.Fprintf(&b, " Readings more than %g° from their own set's axis are unassigned (%d).", g.Config.MaxAngle, an.Unassigned)
	}
	if l := g.Config.Line; l != nil {
		fmt.Fprintf(&b, " Weights: Terzaghi 1/|cos δ| for the sampling line %03.0f/%02.0f, capped at %g", l.Trend, l.Plunge, g.Config.MaxWeight)
		if g.Weights != nil && g.Own {
			b.WriteString(", times each reading's own weight")
		}
		b.WriteString(".")
	} else if g.Weights != nil {
		b.WriteString(" Weights: each reading's own weight column.")
	}
	return b.String()
}
