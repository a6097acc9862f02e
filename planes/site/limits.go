package site

// Physical limits of the inputs. A value beyond them is an error (ErrRange):
// no site has it, and arithmetic on it stops meaning anything (a depth of
// 1e160 m overflows the stresses).
const (
	MaxDepth              = 20000.0 // m below ground: deeper than any mine or borehole
	MaxStress             = 10000.0 // MPa: stresses, pore pressures, cohesion, JCS, UCS
	MaxGradient           = 0.1     // MPa/m: vertical stress and pore pressure (a density of 10,000 kg/m³)
	MaxHorizontalGradient = 10.0    // MPa/m: MaxRatio times MaxGradient
	MaxRatio              = 100.0   // horizontal to vertical stress, total or effective
	MaxFriction           = 10.0    // μ (φ = 84°)
	MaxModulus            = 1000.0  // GPa, Sheorey's Eh
	MaxWeight             = 1000.0  // a reading's own weight
	MaxLength             = 1e6     // m along the ground: chainages, crack distances
	MaxRadius             = 100.0   // m, of a tunnel
)

// Limits on how many things one input may hold, so that time and memory stay
// bounded whatever the input. Beyond them the input is an error (ErrLimit)
// that says the limit.
const (
	MaxSiteBytes    = 2 << 20  // bytes of a site file (its YAML tree takes about 60 times as much memory)
	MaxRow          = 64 << 10 // bytes of one row of a table, a quoted value spanning lines included
	MaxColumns      = 1000     // columns of a table
	MaxReadings     = 1000000  // field readings grouped into sets (cleft sets; assess holds at most MaxPlanes)
	MaxCoverPoints  = 100000   // points of a tunnel's cover profile
	MaxStations     = 10000    // stations along a tunnel
	MaxReportDepths = 50       // report.depths
	MaxWaterCases   = 10       // slope water cases
	MaxHeldText     = 64 << 20 // bytes of names and carried values of the planes or readings held in memory at once
)
