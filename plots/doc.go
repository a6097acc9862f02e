// Package plots draws what packages insitu and planes computed: the
// stereonet projection, the tendency stereonet, the Mohr diagram. It never
// recomputes the physics with formulas of its own: every value on a figure
// comes from planes.Resolve.
//
// Net coordinates: the primitive circle has radius 1, x points east and y
// north (up the page), so a line of trend t plots at angle t clockwise from
// the top. Projections are of the lower hemisphere. Figures are written as
// PNG, SVG or PDF, chosen by the file extension; sizes are vg.Length.
package plots
