package api

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"strings"

	"colloidtriage/advisor/input"
)

// jsonEntries splits {"samples": [...]} into its samples, one at a time,
// and stops at the first sample past maxBatchSamples, so that neither the
// memory nor the time of a request grows with the number of items its
// body holds beyond the limit. The envelope is read strictly (no other
// member, samples given once, nothing after the object); each sample stays
// raw and is decoded on its own later, so that one of the wrong shape
// fails alone.
func jsonEntries(body []byte) ([]batchEntry, error) {
	dec := json.NewDecoder(bytes.NewReader(body))
	if err := expectDelim(dec, '{', "", "object"); err != nil {
		return nil, err
	}
	var entries []batchEntry
	seen := false
	for dec.More() {
		tok, err := dec.Token()
		if err != nil {
			return nil, envelopeSyntax(err)
		}
		key, _ := tok.(string)
		ptr := "/" + escapePointer(key)
		switch {
		case key == "samples" && seen:
			return nil, fail(memberOffContract, "member given twice",
				input.FieldProblem{Pointer: ptr, Reason: "member given twice"})
		case key == "samples":
			seen = true
			if entries, err = jsonSamples(dec); err != nil {
				return nil, err
			}
		case strings.EqualFold(key, "samples"):
			reason := "unknown field (names are case-sensitive: did you mean samples?)"
			return nil, fail(memberOffContract, reason, input.FieldProblem{Pointer: ptr, Reason: reason})
		default:
			return nil, fail(fieldUnknown,
				"the field "+ptr+" is not part of the contract (see /openapi.json); check its spelling and unit suffix",
				input.FieldProblem{Pointer: ptr, Reason: "unknown field"})
		}
	}
	if _, err := dec.Token(); err != nil { // the closing brace
		return nil, envelopeSyntax(err)
	}
	if _, err := dec.Token(); !errors.Is(err, io.EOF) {
		return nil, fail(jsonInvalid, "unexpected data after the JSON value")
	}
	if entries == nil {
		return nil, fail(samplesMissing,
			`send {"samples": [sample, ...]}`, input.FieldProblem{Pointer: "/samples", Reason: "required"})
	}
	return entries, nil
}

// jsonSamples reads the value of samples: an array, whose items it keeps
// raw, or null (samples then counts as missing).
func jsonSamples(dec *json.Decoder) ([]batchEntry, error) {
	tok, err := dec.Token()
	if err != nil {
		return nil, envelopeSyntax(err)
	}
	if tok == nil {
		return nil, nil
	}
	if d, ok := tok.(json.Delim); !ok || d != '[' {
		return nil, wrongEnvelopeType("/samples", "array", tok)
	}
	entries := []batchEntry{}
	for dec.More() {
		if len(entries) == maxBatchSamples {
			return nil, tooManySamples()
		}
		var raw json.RawMessage
		if err := dec.Decode(&raw); err != nil {
			return nil, envelopeSyntax(err)
		}
		entries = append(entries, batchEntry{raw: raw})
	}
	if _, err := dec.Token(); err != nil { // the closing bracket
		return nil, envelopeSyntax(err)
	}
	return entries, nil
}

// expectDelim reads the next token, which must open a value of kind.
func expectDelim(dec *json.Decoder, want json.Delim, pointer, kind string) error {
	tok, err := dec.Token()
	if err != nil {
		return envelopeSyntax(err)
	}
	if d, ok := tok.(json.Delim); !ok || d != want {
		return wrongEnvelopeType(pointer, kind, tok)
	}
	return nil
}

func wrongEnvelopeType(pointer, kind string, tok json.Token) error {
	got := "null"
	switch tok.(type) {
	case json.Delim:
		got = "array"
		if tok == json.Delim('{') {
			got = "object"
		}
	case string:
		got = "string"
	case float64:
		got = "number"
	case bool:
		got = "bool"
	}
	return fail(fieldWrongType, fmt.Sprintf("expected %s, got JSON %s", kind, got),
		input.FieldProblem{Pointer: pointer, Reason: "wrong type: expected " + kind})
}

// envelopeSyntax explains an error of the tokenizer.
func envelopeSyntax(err error) error {
	var syn *json.SyntaxError
	switch {
	case errors.As(err, &syn):
		return fail(jsonInvalid, fmt.Sprintf("syntax error at byte %d: %s", syn.Offset, syn.Error()))
	case errors.Is(err, io.EOF):
		return fail(bodyEmpty, "send a JSON object")
	case errors.Is(err, io.ErrUnexpectedEOF):
		return fail(jsonInvalid, "the JSON value is truncated")
	}
	return fail(jsonInvalid, "")
}

func tooManySamples() error {
	return fail(batchTooLarge,
		fmt.Sprintf("the batch holds more than %d samples; split it into several requests", maxBatchSamples))
}
