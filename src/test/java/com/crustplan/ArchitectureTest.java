package com.crustplan;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The shape the project rules ask for, checked on the compiled classes. */
@AnalyzeClasses(packages = "com.crustplan", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

	@ArchTest
	static final ArchRule engineHasNoSpring = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat()
		.resideInAnyPackage("org.springframework..", "jakarta.persistence..", "jakarta.servlet..");

	@ArchTest
	static final ArchRule onlyThePlanServiceRunsTheEngine = noClasses().that()
		.resideOutsideOfPackage("com.crustplan.engine..")
		.and()
		.doNotHaveFullyQualifiedName("com.crustplan.plan.PlanService")
		.should()
		.dependOnClassesThat()
		.haveFullyQualifiedName("com.crustplan.engine.cook.CookSimulation");

	@ArchTest
	static final ArchRule controllersArePackagePrivate = classes().that()
		.areAnnotatedWith(org.springframework.stereotype.Controller.class)
		.or()
		.areAnnotatedWith(org.springframework.web.bind.annotation.RestController.class)
		.should()
		.notBePublic();

	@ArchTest
	static final ArchRule entitiesStayOutOfTheEngine = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat()
		.areAnnotatedWith(jakarta.persistence.Entity.class);

}
