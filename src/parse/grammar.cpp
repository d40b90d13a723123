// Instantiation of the statement grammar for the one iterator/context couplet uses.
#include "parse/grammar_def.hpp"

namespace couplet::parser {

BOOST_SPIRIT_INSTANTIATE(statement_type, iterator_type, context_type)

statement_type const& statement() { return statement_rule; }

}  // namespace couplet::parser
