package rule

// Internals for the tests of package rule_test, which load the built-in
// rule set through the advisor that declares its vocabulary.
var (
	ConditionsMatchMachine = conditionsMatchMachine
	HasClosure             = hasClosure
)
