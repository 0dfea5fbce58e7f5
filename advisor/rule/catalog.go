package rule

import (
	"bytes"
	"fmt"
	"io/fs"
	"strings"

	"go.yaml.in/yaml/v3"
)

// Catalog holds the stable identifiers of symptoms, causes and remedies with
// their human texts, as loaded from catalog.yaml.
type Catalog struct {
	Symptoms []Entry `yaml:"symptoms" json:"symptoms"`
	Causes   []Entry `yaml:"causes" json:"causes"`
	Remedies []Entry `yaml:"remedies" json:"remedies"`
}

// Entry is one catalogue item.
type Entry struct {
	ID      string `yaml:"id" json:"id"`
	Title   string `yaml:"title,omitempty" json:"title,omitempty"`
	Summary string `yaml:"summary,omitempty" json:"summary,omitempty"`
	Action  string `yaml:"action,omitempty" json:"action,omitempty"`
}

func loadCatalog(fsys fs.FS, name string) (*Catalog, []byte, error) {
	data, err := fs.ReadFile(fsys, name)
	if err != nil {
		return nil, nil, err
	}
	var c Catalog
	if err := decodeStrict(data, &c); err != nil {
		return nil, nil, fmt.Errorf("%s: %w", name, err)
	}
	for _, group := range [][]Entry{c.Symptoms, c.Causes, c.Remedies} {
		seen := map[string]bool{}
		for _, e := range group {
			if e.ID == "" || seen[e.ID] {
				return nil, nil, fmt.Errorf("%s: empty or duplicate id %q", name, e.ID)
			}
			seen[e.ID] = true
		}
	}
	for _, e := range c.Remedies {
		if strings.Count(e.Action, "{target}") > 1 {
			return nil, nil, fmt.Errorf("%s: remedy %q: an action holds at most one {target}", name, e.ID)
		}
	}
	return &c, data, nil
}

func decodeStrict(data []byte, v any) error {
	dec := yaml.NewDecoder(bytes.NewReader(data))
	dec.KnownFields(true)
	return dec.Decode(v)
}

// Cause returns the catalogue entry of a cause.
func (c *Catalog) Cause(id string) (Entry, bool) { return find(c.Causes, id) }

// Remedy returns the catalogue entry of a remedy.
func (c *Catalog) Remedy(id string) (Entry, bool) { return find(c.Remedies, id) }

func find(entries []Entry, id string) (Entry, bool) {
	for _, e := range entries {
		if e.ID == id {
			return e, true
		}
	}
	return Entry{}, false
}
