package api

import (
	"reflect"
	"strconv"
	"strings"
	"sync"
)

// node is the contract of one JSON value of a request type: its Go kind,
// its members or elements, and the unit and valid range its field's tags
// declare. contractOf builds the tree once per type, in one walk of the
// json, validate and unit tags; validation, the CSV columns and strict
// decoding all read it, and the contract test holds the OpenAPI document
// to it.
type node struct {
	kind     reflect.Kind     // pointers removed: Struct, Slice, String, Float64, Int, Bool, ...
	members  map[string]*node // a struct's members by exact JSON name
	names    []string         // the same names in declaration order
	elem     *node            // a slice's element
	unit     string           // the `unit` tag
	rules    map[string]string
	valid    string // the rules as a range a person can read
	required bool   // a document without this member fails validation
	// alternative is the JSON name of the sibling that may stand in for
	// this member (validate required_without).
	alternative string
}

var contracts sync.Map // reflect.Type -> *node

// contractOf returns the contract of values of type t.
func contractOf(t reflect.Type) *node {
	if n, ok := contracts.Load(t); ok {
		return n.(*node)
	}
	n := build(t, "")
	contracts.Store(t, n)
	return n
}

func build(t reflect.Type, tag reflect.StructTag) *node {
	optional := t.Kind() == reflect.Pointer
	for t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	n := &node{kind: t.Kind(), unit: tag.Get("unit"), rules: parseRules(tag.Get("validate")),
		valid: describeTag(tag.Get("validate"))}
	switch t.Kind() {
	case reflect.Struct:
		n.members = map[string]*node{}
		jsonName := map[string]string{}
		for i := range t.NumField() {
			f := t.Field(i)
			name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
			if name == "-" {
				continue
			}
			n.members[name] = build(f.Type, f.Tag)
			n.names = append(n.names, name)
			jsonName[f.Name] = name
		}
		for _, m := range n.members {
			if other, ok := m.rules["required_without"]; ok {
				m.alternative = jsonName[other]
			}
		}
	case reflect.Slice:
		n.elem = build(t.Elem(), "")
	}
	n.required = requiredMember(n, optional)
	return n
}

// requiredMember reports whether a member must be present: the validator
// requires it, or it is a struct (not a pointer) holding a required
// member, or a number (not a pointer, no omitempty) whose zero value fails
// its own bounds, as a size class's diameter does.
func requiredMember(n *node, optional bool) bool {
	_, required := n.rules["required"]
	_, omitempty := n.rules["omitempty"]
	switch {
	case required:
		return true
	case optional || omitempty:
		return false
	case n.kind == reflect.Struct:
		for _, m := range n.members {
			if _, ok := m.rules["required"]; ok || m.alternative != "" {
				return true
			}
		}
	case n.kind == reflect.Float64 || n.kind == reflect.Int:
		bound := func(k string) (float64, bool) {
			v, ok := n.rules[k]
			f, _ := strconv.ParseFloat(v, 64)
			return f, ok
		}
		lo, gt := bound("gt")
		loEq, gte := bound("gte")
		hi, lt := bound("lt")
		hiEq, lte := bound("lte")
		return gt && lo >= 0 || gte && loEq > 0 || lt && hi <= 0 || lte && hiEq < 0
	}
	return false
}

// at returns the contract of the value at a JSON pointer below n (array
// indices step into the element), or nil when n has no such member.
func (n *node) at(pointer string) *node {
	for _, seg := range strings.Split(strings.TrimPrefix(pointer, "/"), "/") {
		switch {
		case n == nil:
			return nil
		case n.kind == reflect.Slice:
			n = n.elem
		default:
			n = n.members[seg]
		}
	}
	return n
}

// parseRules splits a validate tag into its rules (rule -> parameter, ""
// for a rule without one). The rules after dive apply to the elements,
// whose own tags hold them.
func parseRules(tag string) map[string]string {
	out := map[string]string{}
	for _, part := range strings.Split(tag, ",") {
		if part == "dive" {
			break
		}
		if k, v, _ := strings.Cut(part, "="); k != "" {
			out[k] = v
		}
	}
	return out
}

// maxItems is a slice's max=N item limit (0 if none).
func (n *node) maxItems() int {
	m, _ := strconv.Atoi(n.rules["max"])
	return m
}

// describeTag turns validator tags into a range a person can read.
func describeTag(tag string) string {
	var lo, hi string
	var parts []string
	for _, t := range strings.Split(tag, ",") {
		k, v, _ := strings.Cut(t, "=")
		switch k {
		case "gt":
			lo = v + " < value"
		case "gte":
			lo = v + " <= value"
		case "lt":
			hi = "value < " + v
		case "lte":
			hi = "value <= " + v
		case "oneof":
			parts = append(parts, "one of: "+strings.ReplaceAll(v, " ", ", "))
		case "max":
			parts = append(parts, "at most "+v+" items or characters")
		case "min":
			parts = append(parts, "at least "+v+" items")
		}
	}
	switch {
	case lo != "" && hi != "":
		parts = append([]string{lo + strings.TrimPrefix(hi, "value")}, parts...)
	case lo != "":
		parts = append([]string{lo}, parts...)
	case hi != "":
		parts = append([]string{hi}, parts...)
	}
	return strings.Join(parts, "; ")
}
