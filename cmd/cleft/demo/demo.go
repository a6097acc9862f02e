// Package demo holds the invented demo site that cleft embeds: a site file
// and its planes table. Nothing in it is real data.
package demo

import "embed"

// FS holds site.yaml and planes.csv.
//
//go:embed site.yaml planes.csv
var FS embed.FS

// Site is the name of the site file within FS.
const Site = "site.yaml"
