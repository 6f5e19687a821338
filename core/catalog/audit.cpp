// FN_METHOD and FN_DIAGNOSE: read the catalogue, so they work unchanged for
// every function added later.
#include "solarith/catalog.hpp"
#include "solarith/errors.hpp"

namespace solarith::catalog {
namespace {

const FunctionSpec& named_function(const char* caller, const std::string& name)
{
    const FunctionSpec* spec = find(name);
    if (!spec)
        fail_domain(caller, "function_name \"" + name + "\" is not a Solarith function");
    return *spec;
}

Result fn_method(const Args& a)
{
    return method_text(named_function("FN_METHOD", a.text(0)));
}

Result fn_diagnose(const Args& a)
{
    const std::string name = a.text(0);
    const FunctionSpec* spec = find(name);
    if (!spec)
        return "FN_DIAGNOSE: function_name \"" + name + "\" is not a Solarith function";
    return diagnose(*spec, a.rest());
}

}  // namespace

std::vector<FunctionSpec> audit_functions()
{
    return {
        {"FN_METHOD", "Audit",
         "The method behind a Solarith function: its formula, validity range and published source, "
         "as a reviewer would cite it.",
         "text", ResultKind::Text,
         "Returns the method text stored with each function in the Solarith function catalogue.",
         {{"function_name", ArgKind::Text, "", "Name of a Solarith function, e.g. \"RAD_EMISSIVE\""}},
         "\"RAD_EMISSIVE\"",
         fn_method},
        {"FN_DIAGNOSE", "Audit",
         "Explains why a Solarith function refuses its input: \"ok\" when the named function accepts the "
         "arguments, otherwise which argument is wrong, its value and the allowed range.",
         "text", ResultKind::Text,
         "Evaluates the named function with the given arguments under the same checks as the function "
         "itself and returns its error message, or \"ok\".",
         {{"function_name", ArgKind::Text, "", "Name of a Solarith function, e.g. \"RAD_EMISSIVE\""},
          {"arguments", ArgKind::Rest, "", "The arguments of the named function, in its order"}},
         "\"RAD_EMISSIVE\"; 60; 1.2",
         fn_diagnose},
    };
}

}  // namespace solarith::catalog
