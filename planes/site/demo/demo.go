// Package demo holds the invented demo site that cleft embeds: a site file
// with its planes table and its field readings. Nothing in it is real data.
package demo

import "embed"

// FS holds site.yaml, planes.csv and readings.csv.
//
//go:embed site.yaml planes.csv readings.csv
var FS embed.FS

// Site is the name of the site file within FS.
const Site = "site.yaml"
