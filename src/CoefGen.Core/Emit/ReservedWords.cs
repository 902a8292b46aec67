namespace CoefGen.Core.Emit;

/// <summary>
/// Keywords of C (C99..C23), C++ (C++20), VHDL-2008, SystemVerilog (IEEE 1800-2017) and Verilog-2005,
/// compared case-insensitively because VHDL is case-insensitive. Lists written from the standards' keyword
/// tables (value from memory; a missing entry only means a clash is caught by the compiler instead).
/// </summary>
internal static class ReservedWords
{
    private const string C =
        "auto break case char const continue default do double else enum extern float for goto if inline int long " +
        "register restrict return short signed sizeof static struct switch typedef union unsigned void volatile while " +
        "_bool _complex _imaginary alignas alignof bool constexpr false nullptr static_assert thread_local true typeof " +
        "typeof_unqual";

    private const string Cpp =
        "and and_eq asm bitand bitor catch char8_t char16_t char32_t class compl concept consteval constinit const_cast " +
        "co_await co_return co_yield decltype delete dynamic_cast explicit export friend mutable namespace new noexcept " +
        "not not_eq operator or or_eq private protected public reinterpret_cast requires static_cast template this " +
        "throw try typeid typename using virtual wchar_t xor xor_eq";

    private const string Vhdl =
        "abs access after alias all and architecture array assert assume assume_guarantee attribute begin block body " +
        "buffer bus case component configuration constant context cover default disconnect downto else elsif end " +
        "entity exit fairness file for force function generate generic group guarded if impure in inertial inout is " +
        "label library linkage literal loop map mod nand new next nor not null of on open or others out package " +
        "parameter port postponed procedure process property protected pure range record register reject release rem " +
        "report restrict restrict_guarantee return rol ror select sequence severity shared signal sla sll sra srl " +
        "strong subtype then to transport type unaffected units until use variable vmode vprop vunit wait when while " +
        "with xnor xor";

    private const string Verilog =
        "always assign automatic begin buf bufif0 bufif1 case casex casez cell cmos config deassign default defparam " +
        "design disable edge else end endcase endconfig endfunction endgenerate endmodule endprimitive endspecify " +
        "endtable endtask event for force forever fork function generate genvar highz0 highz1 if ifnone incdir include " +
        "initial inout input instance integer join large liblist library localparam macromodule medium module nand " +
        "negedge nmos nor noshowcancelled not notif0 notif1 or output parameter pmos posedge primitive pull0 pull1 " +
        "pulldown pullup pulsestyle_ondetect pulsestyle_onevent rcmos real realtime reg release repeat rnmos rpmos " +
        "rtran rtranif0 rtranif1 scalared showcancelled signed small specify specparam strong0 strong1 supply0 supply1 " +
        "table task time tran tranif0 tranif1 tri tri0 tri1 triand trior trireg unsigned use uwire vectored wait wand " +
        "weak0 weak1 while wire wor xnor xor";

    private const string SystemVerilog =
        "accept_on alias always_comb always_ff always_latch assert assume before bind bins binsof bit break byte chandle " +
        "checker class clocking const constraint context continue cover covergroup coverpoint cross dist do endchecker " +
        "endclass endclocking endgroup endinterface endpackage endprogram endproperty endsequence enum eventually expect " +
        "export extends extern final first_match foreach forkjoin global iff ignore_bins illegal_bins implements implies " +
        "import inside int interconnect interface intersect join_any join_none let local logic longint matches modport " +
        "nettype new nexttime null package packed priority program property protected pure rand randc randcase " +
        "randsequence ref reject_on restrict return s_always s_eventually s_nexttime s_until s_until_with sequence " +
        "shortint shortreal soft solve static string strong struct super sync_accept_on sync_reject_on tagged this " +
        "throughout timeprecision timeunit type typedef union unique unique0 until until_with untyped var virtual void " +
        "wait_order weak wildcard with within";

    private static readonly HashSet<string> All = new(
        string.Join(' ', C, Cpp, Vhdl, Verilog, SystemVerilog).Split(' ', StringSplitOptions.RemoveEmptyEntries),
        StringComparer.OrdinalIgnoreCase);

    /// <summary>True when <paramref name="word"/> is a keyword in any of the five languages (any case).</summary>
    public static bool Contains(string word) => All.Contains(word);
}
