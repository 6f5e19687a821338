// The Calc add-in component: a thin layer between UNO and the catalogue.
//
// Every method converts its UNO arguments to catalogue Values, evaluates the
// catalogue entry, and passes the outcome through one guard: DomainError ->
// IllegalArgumentException (Err:502), EvaluationError ->
// NoConvergenceException (Err:523), anything else -> Err:502 with an
// "internal error" message. Nothing else leaves a method, because an escaping
// exception or a crash here takes down the user's office.
//
// The function wizard's texts (XAddIn) come from the same catalogue; the
// method bodies are generated from it (solarith_glue.inc).
#include "solarith/catalog.hpp"
#include "solarith/errors.hpp"

#include <com/sun/star/lang/IllegalArgumentException.hpp>
#include <com/sun/star/lang/Locale.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/lang/XServiceName.hpp>
#include <com/sun/star/sheet/NoConvergenceException.hpp>
#include <com/sun/star/sheet/XAddIn.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <cppuhelper/factory.hxx>
#include <cppuhelper/implbase4.hxx>
#include <cppuhelper/implementationentry.hxx>
#include <cppuhelper/supportsservice.hxx>
#include <org/solarith/XSolarith.hpp>
#include <rtl/ustring.hxx>

#include <string>
#include <unordered_map>
#include <vector>

namespace css = ::com::sun::star;
using ::rtl::OUString;
using solarith::catalog::Value;
using Values = std::vector<Value>;

namespace {

// Stored in every saved document as the prefix of each function: never change.
constexpr char service_name[] = "org.solarith.Functions";
constexpr char implementation_name[] = "org.solarith.Functions.Implementation";
constexpr char calc_addin_service[] = "com.sun.star.sheet.AddIn";
// Calc's own category for add-ins; families appear in the function reference.
constexpr char category[] = "Add-In";

OUString to_ou(const std::string& text)
{
    return OUString(text.data(), static_cast<sal_Int32>(text.size()), RTL_TEXTENCODING_UTF8);
}

std::string to_utf8(const OUString& text)
{
    const ::rtl::OString utf8 = ::rtl::OUStringToOString(text, RTL_TEXTENCODING_UTF8);
    return std::string(utf8.getStr(), static_cast<std::size_t>(utf8.getLength()));
}

Value from_double(double x)
{
    return Value::of(x);
}

Value from_text(const OUString& text)
{
    return Value::of(to_utf8(text));
}

Value from_any(const css::uno::Any& any);

Value from_range(const css::uno::Sequence<css::uno::Sequence<css::uno::Any>>& range)
{
    std::vector<std::vector<Value>> rows;
    rows.reserve(static_cast<std::size_t>(range.getLength()));
    for (const auto& row : range) {
        std::vector<Value> cells;
        cells.reserve(static_cast<std::size_t>(row.getLength()));
        for (const auto& cell : row)
            cells.push_back(from_any(cell));
        rows.push_back(std::move(cells));
    }
    return Value::of_table(std::move(rows));
}

Value from_any(const css::uno::Any& any)
{
    switch (any.getValueTypeClass()) {
    case css::uno::TypeClass_VOID: return Value::omitted();
    case css::uno::TypeClass_BOOLEAN: return Value::of(*static_cast<const sal_Bool*>(any.getValue()) ? 1.0 : 0.0);
    case css::uno::TypeClass_STRING: return from_text(*static_cast<const OUString*>(any.getValue()));
    case css::uno::TypeClass_SEQUENCE: {
        css::uno::Sequence<css::uno::Sequence<css::uno::Any>> range;
        if (any >>= range)
            return from_range(range);
        return Value::of(std::string("(an unsupported array)"));
    }
    default: {
        double x = 0;
        if (any >>= x)
            return Value::of(x);
        return Value::of("(a value of type " + to_utf8(any.getValueTypeName()) + ")");
    }
    }
}

Values with_rest(Values values, const css::uno::Sequence<css::uno::Any>& rest)
{
    for (const auto& any : rest)
        values.push_back(from_any(any));
    return values;
}

class SolarithAddIn
    : public cppu::WeakImplHelper4<org::solarith::XSolarith, css::sheet::XAddIn, css::lang::XServiceName,
                                   css::lang::XServiceInfo> {
public:
    SolarithAddIn()
    {
        const auto& all = solarith::catalog::functions();
        for (std::size_t i = 0; i < all.size(); ++i)
            by_programmatic_name_.emplace(solarith::catalog::programmatic_name(all[i].name), i);
    }

    // XAddIn (the misspelt "Funtion" is the interface's own)
    OUString SAL_CALL getProgrammaticFuntionName(const OUString& display_name) override
    {
        const auto* f = solarith::catalog::find(to_utf8(display_name));
        return f ? to_ou(solarith::catalog::programmatic_name(f->name)) : OUString();
    }
    OUString SAL_CALL getDisplayFunctionName(const OUString& programmatic) override
    {
        const auto* f = lookup(programmatic);
        return f ? to_ou(std::string(f->name)) : OUString();
    }
    OUString SAL_CALL getFunctionDescription(const OUString& programmatic) override
    {
        const auto* f = lookup(programmatic);
        return f ? to_ou(solarith::catalog::function_help(*f)) : OUString();
    }
    OUString SAL_CALL getDisplayArgumentName(const OUString& programmatic, sal_Int32 argument) override
    {
        const auto* a = argument_spec(programmatic, argument);
        return a ? to_ou(std::string(a->name)) : OUString();
    }
    OUString SAL_CALL getArgumentDescription(const OUString& programmatic, sal_Int32 argument) override
    {
        const auto* a = argument_spec(programmatic, argument);
        return a ? to_ou(solarith::catalog::argument_help(*a)) : OUString();
    }
    OUString SAL_CALL getProgrammaticCategoryName(const OUString&) override { return category; }
    OUString SAL_CALL getDisplayCategoryName(const OUString&) override { return category; }

    // XLocalizable (base of XAddIn): the texts are English whatever the locale.
    void SAL_CALL setLocale(const css::lang::Locale& locale) override { locale_ = locale; }
    css::lang::Locale SAL_CALL getLocale() override { return locale_; }

    // XServiceName
    OUString SAL_CALL getServiceName() override { return service_name; }

    // XServiceInfo
    OUString SAL_CALL getImplementationName() override { return implementation_name; }
    sal_Bool SAL_CALL supportsService(const OUString& name) override
    {
        return cppu::supportsService(this, name);
    }
    css::uno::Sequence<OUString> SAL_CALL getSupportedServiceNames() override { return service_names(); }

    static css::uno::Sequence<OUString> service_names()
    {
        const OUString names[] = {calc_addin_service, service_name};
        return css::uno::Sequence<OUString>(names, 2);
    }

    // XSolarith: one method per catalogue entry.
#include "solarith_glue.inc"

private:
    const solarith::catalog::FunctionSpec* lookup(const OUString& programmatic) const
    {
        const auto found = by_programmatic_name_.find(to_utf8(programmatic));
        return found == by_programmatic_name_.end() ? nullptr : &solarith::catalog::functions()[found->second];
    }

    const solarith::catalog::ArgSpec* argument_spec(const OUString& programmatic, sal_Int32 argument) const
    {
        const auto* f = lookup(programmatic);
        if (!f || argument < 0 || static_cast<std::size_t>(argument) >= f->args.size())
            return nullptr;
        return &f->args[static_cast<std::size_t>(argument)];
    }

    template <class Call>
    auto guarded(Call call) -> decltype(call())
    {
        try {
            return call();
        } catch (const solarith::DomainError& e) {
            throw css::lang::IllegalArgumentException(to_ou(e.what()), static_cast<cppu::OWeakObject*>(this), 0);
        } catch (const solarith::EvaluationError& e) {
            throw css::sheet::NoConvergenceException(to_ou(e.what()), static_cast<cppu::OWeakObject*>(this));
        } catch (...) {
            throw css::lang::IllegalArgumentException("Solarith: internal error",
                                                      static_cast<cppu::OWeakObject*>(this), 0);
        }
    }

    template <class MakeValues>
    double number_result(std::size_t index, MakeValues make_values)
    {
        return guarded([&] {
            const auto& spec = solarith::catalog::functions()[index];
            return std::get<double>(solarith::catalog::evaluate(spec, make_values()));
        });
    }

    template <class MakeValues>
    OUString text_result(std::size_t index, MakeValues make_values)
    {
        return guarded([&] {
            const auto& spec = solarith::catalog::functions()[index];
            return to_ou(std::get<std::string>(solarith::catalog::evaluate(spec, make_values())));
        });
    }

    template <class MakeValues>
    css::uno::Sequence<css::uno::Sequence<css::uno::Any>> table_result(std::size_t index, MakeValues make_values)
    {
        return guarded([&] {
            const auto& spec = solarith::catalog::functions()[index];
            return to_uno(std::get<solarith::catalog::Table>(solarith::catalog::evaluate(spec, make_values())));
        });
    }

    static css::uno::Sequence<css::uno::Sequence<css::uno::Any>> to_uno(const solarith::catalog::Table& table)
    {
        css::uno::Sequence<css::uno::Sequence<css::uno::Any>> rows(static_cast<sal_Int32>(table.size()));
        auto* row_out = rows.getArray();
        for (const auto& row : table) {
            css::uno::Sequence<css::uno::Any> cells(static_cast<sal_Int32>(row.size()));
            auto* cell_out = cells.getArray();
            for (const auto& cell : row)
                *cell_out++ = cell.kind == Value::Kind::Number ? css::uno::Any(cell.number)
                                                               : css::uno::Any(to_ou(cell.text));
            *row_out++ = cells;
        }
        return rows;
    }

    std::unordered_map<std::string, std::size_t> by_programmatic_name_;
    css::lang::Locale locale_;
};

css::uno::Reference<css::uno::XInterface> SAL_CALL create_instance(
    const css::uno::Reference<css::uno::XComponentContext>&)
{
    return static_cast<cppu::OWeakObject*>(new SolarithAddIn);
}

OUString SAL_CALL get_implementation_name()
{
    return implementation_name;
}

css::uno::Sequence<OUString> SAL_CALL get_service_names()
{
    return SolarithAddIn::service_names();
}

const cppu::ImplementationEntry implementation_entries[] = {
    {create_instance, get_implementation_name, get_service_names, cppu::createSingleComponentFactory, nullptr, 0},
    {nullptr, nullptr, nullptr, nullptr, nullptr, 0}};

}  // namespace

extern "C" SAL_DLLPUBLIC_EXPORT void* SAL_CALL component_getFactory(const char* implementation,
                                                                    void* service_manager, void* registry_key)
{
    return cppu::component_getFactoryHelper(implementation, service_manager, registry_key,
                                            implementation_entries);
}
