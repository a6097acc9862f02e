// Command cleft screens rock discontinuities against the in-situ stress:
// far-field stress at depth, traction on every joint and fault with pore
// pressure, slip and dilation tendency, factor of safety and pressure to slip.
package main

import (
	"os"
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdin, os.Stdout, os.Stderr))
}
