// Unit quantities typed or pasted by a user (units::parse*): the first byte picks the quantity, the rest is the text.
#include "fuzzsupport.hpp"
#include "promises.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    fuzzsupport::require(fuzzpromise::units(fuzzsupport::bytes(data, size)));
    return 0;
}
